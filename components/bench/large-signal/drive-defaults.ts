/**
 * What the large-signal views run when the user has not said: the drive the design's file states (its
 * `distortion` frequency, else its transient `drive`), otherwise a 1 kHz sine at the capsule; the level sweep of
 * the THD plot; and the length of the power-on run (the file's own power-on `stop`, else DEFAULT_POWER_ON_STOP_S).
 */
import { QUANTITIES, type Quantity } from "@/sim/circuit/quantities";
import { parseLiteral } from "@/sim/circuit/values";

export const DEFAULT_DRIVE_FREQUENCY_HZ = 1000;
/** the THD plot's sweep, dB SPL: 94 dB (1 Pa) up to 154 dB in 6 dB steps (common practice: 1 Pa is the reference level) */
export const SWEEP_FROM_DB = 94;
export const SWEEP_TO_DB = 154;
export const SWEEP_STEP_DB = 6;
/** s; a gigaohm bias into tens of picofarads settles in seconds (the demo LA-47 in about 17 s: ln(100)·RC) */
export const DEFAULT_POWER_ON_STOP_S = 30;

export function sweepLevels(from = SWEEP_FROM_DB, to = SWEEP_TO_DB, step = SWEEP_STEP_DB): number[] {
  const levels: number[] = [];
  for (let l = from; l <= to + 1e-9; l += step) levels.push(l);
  return levels;
}

type Analyses = Record<string, unknown> | undefined;

function record(value: unknown): Record<string, unknown> | undefined {
  return value !== null && typeof value === "object" ? (value as Record<string, unknown>) : undefined;
}

/** A positive literal ("1 kHz", "12", "20m"), or null (an expression of parameters is left to the defaults). */
function positive(value: unknown, quantity: Quantity): number | null {
  const v = typeof value === "number" ? value : typeof value === "string" ? literal(value, quantity) : null;
  return v !== null && Number.isFinite(v) && v > 0 ? v : null;
}

function literal(text: string, quantity: Quantity): number | null {
  const r = parseLiteral(text, quantity);
  return r.kind === "value" ? r.value : null;
}

export function driveFrequency(analyses: Analyses): number {
  const distortion = record(analyses?.distortion);
  const drive = record(record(analyses?.transient)?.drive);
  return (
    positive(distortion?.frequency, QUANTITIES.frequency) ??
    positive(drive?.frequency, QUANTITIES.frequency) ??
    DEFAULT_DRIVE_FREQUENCY_HZ
  );
}

export function powerOnStop(analyses: Analyses): number {
  const transient = record(analyses?.transient);
  return (
    (transient?.from === "power-on" && positive(transient.stop, QUANTITIES.dimensionless)) || DEFAULT_POWER_ON_STOP_S
  );
}
