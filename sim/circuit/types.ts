/**
 * The boundary between reading a circuit file and solving it.
 *
 * `sim/circuit/` turns a raw circuit file (see the contract in the contributor guide) into an
 * `ElaboratedCircuit`: variant applied, parameters evaluated, every value a plain SI number, defaults
 * filled in, disabled parts removed. `sim/analyses/` solves an `ElaboratedCircuit` and never sees strings
 * that still need parsing. Units: SI throughout (V, A, Ω, F, H, Hz, K, m, Pa).
 */

export const PART_KINDS = [
  "resistor",
  "capacitor",
  "inductor",
  "vsource",
  "isource",
  "vcvs",
  "vccs",
  "capsule",
  "jfet",
  "triode",
  "bjt",
  "transformer",
  "cable",
  "load",
] as const;

export type PartKind = (typeof PART_KINDS)[number];

/** Name of the ground net; always present. */
export const GROUND = "0";

/** Optional role of a source for the large-signal analyses. */
export type SourceRole = "input" | "supply";

export type ToleranceDistribution = "uniform" | "normal";

/**
 * One enabled part with every value resolved to a number (SI units) and every default filled.
 * Non-numeric settings (a JFET's or BJT's `type`) are kept as strings in `values`.
 * A value the contract calls "infinite" by default (a BJT's `vaf`, a load's `resistance`) is `Infinity`.
 * A value with no default that was not given and is optional (a capsule's `resonance`) is absent.
 */
export interface ElaboratedPart {
  id: string;
  kind: PartKind;
  /** pin name → net name */
  pins: Record<string, string>;
  values: Record<string, number | string>;
  /** value name → relative tolerance (0.05 for 5 %) */
  tolerance: Record<string, number>;
  toleranceDistribution: ToleranceDistribution;
  noiseless: boolean;
  role?: SourceRole;
}

export interface LogGrid {
  from: number;
  to: number;
  pointsPerDecade: number;
}

/** A frequency request: a log grid (both ends included) or an explicit list. */
export type FrequencyRequest = ({ kind: "grid" } & LogGrid) | { kind: "list"; frequencies: number[] };

export interface AnalysisRequests {
  op?: { temperature: number };
  ac?: { frequencies: FrequencyRequest; pressure: number; temperature: number };
  noise?: { frequencies: FrequencyRequest; temperature: number };
  sweep?: { parameter: string; values: number[] };
  spread?: { runs: number; seed: number };
  /** Large-signal analyses (contract, "Large-signal analyses"); times in s. */
  transient?: TransientRequest;
  distortion?: DistortionRequest;
  ripple?: { frequencies: FrequencyRequest; temperature: number };
}

/** A drive of the large-signal analyses: exactly one of `splDb` (capsules) and `level` (input sources). */
export interface DriveRequest {
  shape: "sine" | "burst";
  /** Hz */
  frequency: number;
  /** dB SPL re 20 µPa */
  splDb?: number;
  level?: number;
  /** whole periods of a burst */
  cycles?: number;
}

export interface TransientRequest {
  /** s */
  stop: number;
  /** largest step allowed, s */
  step: number;
  from: "op" | "power-on";
  drive?: DriveRequest;
  /** nets whose waveforms are reported */
  probe: string[];
  temperature: number;
}

/** Exactly one of `splDb` and `levels` is present. */
export interface DistortionRequest {
  /** Hz */
  frequency: number;
  splDb?: number[];
  levels?: number[];
  temperature: number;
}

export interface Target {
  figure: string;
  min?: number;
  max?: number;
  variant?: string;
}

export interface ElaboratedCircuit {
  title: string;
  /** evaluated parameters (after the variant's overrides), SI numbers */
  parameters: Record<string, number>;
  /** enabled parts only, in file order */
  parts: ElaboratedPart[];
  output: { plus: string; minus: string };
  /** every net named by an enabled part's pin, plus "0"; sorted with "0" first */
  nets: string[];
  analyses: AnalysisRequests;
  targets: Target[];
  variant?: string;
}

/** Default analysis temperature, K (25 °C). */
export const DEFAULT_TEMPERATURE_K = 298.15;
