/**
 * Frequency requests → the frequencies an analysis solves at: a log grid with both ends exactly, or a list sorted
 * ascending without duplicates.
 */
import type { FrequencyRequest, LogGrid } from "./types";

/** A grid point this close (relative) to the top end is the top end. */
const SAME_FREQUENCY_RELATIVE = 1e-9;

/**
 * Points at `from`·10^(i/pointsPerDecade) (so decade points such as 1 kHz fall on the grid exactly when `from` is a
 * power of ten), then `to` itself.
 */
export function logGrid({ from, to, pointsPerDecade }: LogGrid): Float64Array {
  if (to <= from) return Float64Array.of(from);
  const points: number[] = [];
  for (let i = 0; ; i += 1) {
    const f = from * 10 ** (i / pointsPerDecade);
    if (f >= to * (1 - SAME_FREQUENCY_RELATIVE)) break;
    points.push(f);
  }
  points.push(to);
  return Float64Array.from(points);
}

/** Expands a request into a sorted, de-duplicated array of frequencies in Hz. */
export function expandFrequencies(request: FrequencyRequest): Float64Array {
  if (request.kind === "grid") return logGrid(request);
  const sorted = Float64Array.from(request.frequencies).sort();
  return sorted.filter((f, i) => i === 0 || f !== sorted[i - 1]);
}

/** How many points a request gives, without building it. */
export function countFrequencies(request: FrequencyRequest): number {
  if (request.kind === "list") return new Set(request.frequencies).size;
  if (request.to <= request.from) return 1;
  return Math.ceil(Math.log10(request.to / request.from) * request.pointsPerDecade * (1 - SAME_FREQUENCY_RELATIVE)) + 1;
}
