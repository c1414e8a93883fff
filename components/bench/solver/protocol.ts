/**
 * What the bench asks its solver workers and what they answer. Everything here crosses a worker boundary by
 * structured clone: plain objects only. Errors come back as the engine's `SimErrorJson` (code, message and the
 * part / net / field at fault) so the canvas can point at the part; read them through `BenchSolveError`.
 */
import type { FigureSensitivity } from "@/sim/analyses/figure-sensitivity";
import type { OutputImpedanceSweep } from "@/sim/analyses/output-impedance-sweep";
import type { SimErrorJson } from "@/sim/errors";
import type { Figures, OutputDocument, SpreadResult } from "@/sim/results";
import type { Destination } from "../destinations/presets";

/** The error the bench shows and the canvas highlights: the engine's code, message, and part / net / field. */
export type BenchSolveError = SimErrorJson;

export interface LiveRequest {
  circuit: unknown;
  variant?: string;
}

export interface LiveResult {
  document: OutputDocument;
  /** how long the engine took inside the worker (ms), for the update timing */
  solveMs: number;
}

/** |Zout(f)| on the live result's AC grid: asked for after the live result, so it never delays the Bode plot. */
export type ImpedanceResult = OutputImpedanceSweep;

export type Outcome<T> = { ok: true; value: T } | { ok: false; error: BenchSolveError };

/** One overlaid curve: a destination, a variant, a sweep value or another revision. */
export interface Curve {
  id: string;
  label: string;
  group: "destination" | "variant" | "sweep" | "revision";
  frequency: number[];
  magnitude_db: number[];
  phase_deg: number[];
  figures: Figures | null;
  error?: BenchSolveError;
}

export interface RevisionOverlay {
  id: string;
  label: string;
  circuit: unknown;
}

export interface FamilyRequest {
  circuit: unknown;
  variant?: string;
  destinations: Destination[];
  cableLengthM: number;
  variants: string[];
  sweep?: { parameter: string; values: (number | string)[] };
  revisions: RevisionOverlay[];
  /** Monte Carlo over the tolerances, when the engine provides it */
  spread?: { runs: number; seed: number };
}

export interface FamilyResult {
  curves: Curve[];
  /** the engine's spread (with `envelope` when it gives one); null when asked and the engine returns none */
  spread: SpreadResult | null;
}

export interface ExplainRequest {
  circuit: unknown;
  variant?: string;
  relativeStep?: number;
}

export type ExplainResult = FigureSensitivity[];

/** (done, total) units of work of a long job */
export type ProgressCallback = (done: number, total: number) => void;
