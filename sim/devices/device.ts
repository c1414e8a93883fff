/**
 * The one interface every device kind implements (one module per kind in this folder).
 *
 * Unknowns follow modified nodal analysis (Ho, Ruehli and Brennan, 1975): one voltage per non-ground net, plus
 * whatever extra unknowns a kind asks for (a voltage source's branch current, a transformer's internal node).
 * Row convention: a net's row sums the currents LEAVING that net through device pins (A); a branch row is the
 * branch's voltage equation (V). A device stamps
 * - DC: its Newton companion (Jacobian entries and right-hand side linearised at the present iterate), limiting
 *   its junction voltages between iterations where it is nonlinear;
 * - AC: its small-signal matrix at the operating point split as G + jωC — exact for every v1 kind, because every
 *   reactance is a capacitance or an inductance carried by a branch current (the −L sits in C) — and, for
 *   sources and capsules, its drive on the right-hand side at a given frequency;
 * - its report: region, small-signal parameters and warnings at the operating point;
 * - its noise generators at the operating point (used by the noise analysis);
 * - transient (large-signal analyses): `stampTransient`, its Newton companion at one time step with every stored
 *   quantity (a capacitance's charge, an inductance's flux, a capsule's filtered pressure) replaced by the
 *   integration formula through the context's helpers; kinds without memory leave it out and their DC stamp is used.
 */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import type { OpValue, SimWarning } from "../results";
import type { TwoTerminalHandles } from "./stamps";

export type UnknownKind = "voltage" | "current";

export interface ExtraUnknown {
  /** shown in messages: "branch current", "internal node p1′", … */
  label: string;
  kind: UnknownKind;
}

/** What a device is given when it is created: where its pins and its extra unknowns are. */
export interface DeviceWiring {
  /** unknown index of the net on each pin; −1 for ground */
  pins: Record<string, number>;
  /** indices of the extra unknowns, in the order `extraUnknowns` listed them */
  extra: number[];
}

/** The Newton iteration's view, given to `stampDc`. */
export interface DcStampContext {
  /** present iterate, by unknown (V for nets and internal nodes, A for branch currents) */
  readonly x: Float64Array;
  /** thermal voltage kT/q at the analysis temperature, V */
  readonly thermalVoltage: number;
  /** 0…1: independent DC sources are multiplied by this (source stepping) */
  readonly sourceScale: number;
  /** add to the Jacobian entry behind a handle */
  add(handle: number, value: number): void;
  /** add to the right-hand side of a row (ignored for ground, row < 0) */
  addRhs(row: number, value: number): void;
  /** a device reports that it limited a junction step: this iterate cannot count as converged */
  markLimited(): void;
}

export interface AcStampContext {
  /** the operating point, by unknown */
  readonly x: Float64Array;
  readonly thermalVoltage: number;
  addConductance(handle: number, value: number): void;
  /** coefficient of jω */
  addReactance(handle: number, value: number): void;
}

export interface AcDriveContext {
  /** the operating point, by unknown (a capsule's polarisation comes from it) */
  readonly x: Float64Array;
  /** Hz */
  readonly frequency: number;
  /** acoustic drive on every capsule, Pa */
  readonly pressure: number;
  addRhs(row: number, re: number, im: number): void;
}

export interface OperatingPointView {
  readonly x: Float64Array;
  readonly thermalVoltage: number;
  /** K */
  readonly temperature: number;
}

/**
 * The transient Newton iteration's view, given to `stampTransient` at one time step (sim/analyses/transient*.ts).
 * It is a DC context (the same Jacobian and right-hand side, source scale 1) plus the integration of stored
 * quantities: a device names each stored quantity by a small local index (0, 1, …, below `transientStateCount`)
 * and the context keeps its history and turns it into a companion (conductance plus current) by the integration
 * formula of the present step: dq/dt ≈ a0·q + history.
 */
export interface TransientStampContext extends DcStampContext {
  /** time of the point being solved, s */
  readonly time: number;
  /** the DC operating point by unknown (a capsule's polarisation V0 comes from it) */
  readonly operatingPoint: Float64Array;
  /** value of an independent source at this time: its dc plus the drive's waveform where it drives it (V or A) */
  sourceValue(part: ElaboratedPart): number;
  /**
   * Linear capacitance `capacitance` (F) between nets a and b (handles declared by the device), stored quantity
   * `state`: charge q = C·(V(a) − V(b) − offset). `offset` (V) is an EMF in series (a capsule's).
   */
  capacitance(
    state: number,
    handles: TwoTerminalHandles,
    a: number,
    b: number,
    capacitance: number,
    offset?: number,
  ): void;
  /**
   * Linear inductance `inductance` (H) of the branch current `branch` whose row is V(a) − V(b) − … = 0 and whose
   * self entry is `self`: flux φ = L·I, stored quantity `state`; adds −dφ/dt to the row.
   */
  inductance(state: number, self: number, branch: number, inductance: number): void;
  /**
   * The acoustic pressure on a capsule at this time, Pa, through the second-order resonance filter
   * 1/(1 + s/(ω0·q) + s²/ω0²) when `resonance` (Hz) is given (stored quantities `state` and `state + 1`), else
   * the drive's pressure itself.
   */
  capsulePressure(state: number, resonance: number | undefined, q: number): number;
}

/** How close a device is to leaving its intended large-signal region, and which boundary. */
export interface RegionMargin {
  /** V; negative once the device has left its region */
  margin: number;
  /**
   * The boundary in the circuit-file contract's words (max_spl_limited_by.reason). "saturation" there means the
   * output device ran out of voltage headroom: a bipolar transistor's Vce collapsing, and equally a JFET whose Vds
   * falls below Vgs − Vp — which the JFET trade calls entering the ohmic (triode) region, so `detail` says that.
   */
  reason: "cut-off" | "saturation" | "gate conduction" | "grid conduction";
  /** the device's own name for the boundary, where the contract's word would mislead (see `reason`) */
  detail?: string;
}

export interface DeviceReport {
  values: Record<string, OpValue>;
  warnings: SimWarning[];
}

/**
 * A noise generator: a random source on the right-hand side between two rows, `plus` receiving +1 and `minus`
 * −1 (either may be −1 for ground). Between two nets it is a current generator (psd in A²/Hz) driving current
 * into `plus` and out of `minus`; on a branch row (`plus` is the branch row, `minus` −1) it is a voltage generator
 * in series with that branch (psd in V²/Hz), as the series resistance of an inductor or a cable section needs.
 */
export interface NoiseGenerator {
  part: string;
  /** which physical mechanism, for the per-part breakdown */
  label: string;
  plus: number;
  minus: number;
  /** power spectral density at frequency f (Hz) */
  psd(frequency: number): number;
}

export interface Device {
  readonly part: ElaboratedPart;
  /** reserve every matrix position this device ever writes */
  declare(pattern: PatternBuilder): void;
  /** start a Newton run from iterate x (resets junction-limiting memory) */
  startNewton(x: Float64Array): void;
  stampDc(ctx: DcStampContext): void;
  stampAc(ctx: AcStampContext): void;
  /** sources and capsules only */
  stampAcDrive?(ctx: AcDriveContext): void;
  /** null when a kind has nothing to report */
  report(op: OperatingPointView): DeviceReport | null;
  noiseSources(op: OperatingPointView): NoiseGenerator[];
  /** how many stored quantities the transient stamp integrates (absent: none) */
  transientStateCount?(): number;
  /** transient companion at one time step (absent: `stampDc`, for kinds without memory) */
  stampTransient?(ctx: TransientStampContext): void;
  /** active devices: the nearest region boundary at solution x (used for max_spl_limited_by) */
  regionMargin?(x: Float64Array, thermalVoltage: number): RegionMargin | null;
}

export interface DeviceKind {
  /** extra unknowns of this part beyond its pins' nets */
  extraUnknowns(part: ElaboratedPart): ExtraUnknown[];
  create(part: ElaboratedPart, wiring: DeviceWiring): Device;
}

/** Read a numeric value the elaborator guarantees (defaults filled). */
export function numberValue(part: ElaboratedPart, name: string): number {
  const v = part.values[name];
  if (typeof v !== "number") throw new Error(`internal: ${part.id}.${name} is not a number`);
  return v;
}

/** Read an optional numeric value (absent → undefined). */
export function optionalNumber(part: ElaboratedPart, name: string): number | undefined {
  const v = part.values[name];
  return typeof v === "number" ? v : undefined;
}
