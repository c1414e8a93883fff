/**
 * The output side of the boundary: what `simulate(circuit)` (sim/analyses/simulate.ts) returns and what the
 * headless command prints. Shapes follow the circuit-file contract's "headless command" document; units are SI
 * (V, A, Ω, Hz, V/√Hz). A figure that does not apply, or would be −∞ or NaN, is `null`.
 */

/** A notice about the solution that is not an error: a device out of its intended region, a capsule gap closing. */
export interface SimWarning {
  message: string;
  part?: string;
  net?: string;
}

/** A value in an operating-point part record: a number (SI), a region name, or null where it does not apply. */
export type OpValue = number | string | null;

export interface OpResult {
  /** net name → DC voltage to ground, V */
  nets: Record<string, number>;
  /** part id → its DC figures (a source's `current`; a device's `region`, `id`, `gm`, …) */
  parts: Record<string, Record<string, OpValue>>;
  warnings: SimWarning[];
}

export interface AcResult {
  /** Hz, ascending */
  frequency: number[];
  /** V(plus) − V(minus) for the drive, real and imaginary parts, V */
  re: number[];
  im: number[];
  magnitude_db: number[];
  phase_deg: number[];
  warnings?: SimWarning[];
}

export interface NoiseResult {
  frequency: number[];
  /** V/√Hz */
  output_density: number[];
  /** part id → its contribution, V/√Hz */
  contributions: Record<string, number[]>;
  /** V */
  rms: number | null;
  rms_a_weighted: number | null;
  warnings?: SimWarning[];
}

export type Polarity = "non-inverting" | "inverting";

/** The headline numbers. Later analyses add entries (max_spl_db, settle_time_s, …); each is null where it does not apply. */
export interface Figures {
  gain_1khz_db?: number | null;
  sensitivity_v_per_pa?: number | null;
  sensitivity_db_re_1v_per_pa?: number | null;
  low_corner_hz?: number | null;
  high_corner_hz?: number | null;
  output_impedance_1khz_ohm?: number | null;
  polarity?: Polarity | null;
  self_noise_dba_spl?: number | null;
  [figure: string]: number | string | null | undefined | Record<string, unknown>;
}

/** The `transient` analysis (contract): every accepted time point, s; V(plus) − V(minus), V; probed nets, V. */
export interface TransientResult {
  time: number[];
  output: number[];
  nets: Record<string, number[]>;
  /** each capsule's polarisation V(diaphragm) − V(backplate) + electret_voltage against time, V */
  polarisation?: Record<string, number[]>;
  warnings?: SimWarning[];
}

/** One level of the `distortion` analysis (contract): `spl_db` or `level`, fundamental in peak volts. */
export interface DistortionPoint {
  spl_db?: number;
  level?: number;
  fundamental: number;
  /** harmonics 2 … 10 relative to the fundamental, dB */
  harmonics_db: number[];
  thd_percent: number;
  /** this level's warnings: a capsule gap closing, a waveform that did not settle */
  warnings?: SimWarning[];
}

/** The `ripple` analysis (contract): 20·log10 |Vout/Vsupply| at each frequency. */
export interface RippleResult {
  frequency: number[];
  rejection_db: number[];
  warnings?: SimWarning[];
}

/** Which device leaves its region first at max_spl_db, and how. */
export interface LimitedBy {
  part: string;
  /** the contract's words: "cut-off", "saturation", "gate conduction" or "grid conduction" */
  reason: string;
  /** the boundary in the device's own terms where the contract's word is ambiguous for it (a JFET's ohmic region) */
  detail?: string;
}

/** What `simulate` returns for one elaborated circuit. Keys of analyses that did not run are absent. */
export interface SimulationResult {
  op?: OpResult;
  ac?: AcResult;
  noise?: NoiseResult;
  figures: Figures;
  transient?: TransientResult;
  distortion?: DistortionPoint[];
  ripple?: RippleResult;
  /** Monte Carlo over the tolerances, when `analyses.spread` asks for it */
  spread?: SpreadResult;
}

export interface SweepPoint {
  /** the swept parameter's value, SI */
  value: number;
  figures: Figures;
}

export interface FigureStatistics {
  mean: number | null;
  sd: number | null;
  min: number | null;
  max: number | null;
  p5: number | null;
  p95: number | null;
}

export interface SpreadResult {
  /** runs asked for */
  runs: number;
  /** runs whose operating point or small-signal solve failed (left out of the statistics); absent when none */
  failed_runs?: number;
  figures: Record<string, FigureStatistics>;
  envelope?: { frequency: number[]; min_db: number[]; max_db: number[]; p5_db: number[]; p95_db: number[] };
  warnings?: SimWarning[];
}

export interface TargetCheck {
  figure: string;
  variant?: string;
  value: number | string | null;
  min?: number;
  max?: number;
  pass: boolean;
}

/** The one JSON document the headless command prints. */
export interface OutputDocument extends SimulationResult {
  sweep?: SweepPoint[];
  spread?: SpreadResult;
  checks?: TargetCheck[];
}

/** What the headless command prints on bad input (exit status 2). */
export interface ErrorDocument {
  error: { code: string; message: string; part?: string; net?: string; field?: string };
}
