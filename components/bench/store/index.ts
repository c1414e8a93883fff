/** The bench store: document, selection, variant, read-only, undo/redo. */
export { type BenchState, type BenchStore, createBenchStore } from "./bench-store";
export { BenchStoreProvider, useBench, useBenchStore } from "./bench-store-context";
export type { Clip } from "./clipboard";
export type { EditResult, PartPatch } from "./edits";
export { HISTORY_LIMIT } from "./history";
export { EMPTY_SELECTION, type ItemRef, type Selection } from "./selection";
