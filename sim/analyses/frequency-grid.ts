/**
 * Expand a FrequencyRequest (contract): a log grid from `from` to `to` with `pointsPerDecade` points per decade,
 * both ends included; or a list, sorted ascending without duplicates.
 */
import type { FrequencyRequest } from "../circuit/types";

/** A grid point within this fraction of a step of `to` is taken as `to` itself (rounding of the log steps). */
export const GRID_END_SNAP_FRACTION = 1e-6;

export function expandFrequencies(request: FrequencyRequest): number[] {
  if (request.kind === "list") return [...new Set(request.frequencies)].sort((a, b) => a - b);
  const { from, to, pointsPerDecade } = request;
  if (to <= from) return [from];
  const steps = Math.log10(to / from) * pointsPerDecade;
  const whole = Math.floor(steps + GRID_END_SNAP_FRACTION);
  const out: number[] = [];
  for (let i = 0; i <= whole; i++) out.push(from * 10 ** (i / pointsPerDecade));
  if (steps - whole > GRID_END_SNAP_FRACTION) out.push(to);
  else out[out.length - 1] = to;
  return out;
}
