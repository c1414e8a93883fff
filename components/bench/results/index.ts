/**
 * The bench's live results, for the composed bench (components/bench/bench.tsx) and the bench-link page:
 * `<BenchResults document … />` whole, or its panels one by one, and the solver hook with its error type.
 */
export type { ApplyValues } from "../calculators/capsule-calculator";
export { CalculatorsPanel } from "../calculators/calculators-panel";
export { DESTINATION_PRESETS, type Destination } from "../destinations/presets";
export { withDestination } from "../destinations/with-destination";
export { ExplainPanel } from "../explain/explain-panel";
export type { BenchSolveError, LiveResult } from "../solver/protocol";
export { type LiveSolveState, useLiveSolve } from "../solver/use-live-solve";
export { type BenchLiveState, BenchResults, type BenchResultsProps } from "./bench-results";
export { FiguresPanel } from "./figures-panel";
export { OperatingPointPanel, WarningsList } from "./operating-point-panel";
export { SolveErrorPanel } from "./solve-error-panel";
