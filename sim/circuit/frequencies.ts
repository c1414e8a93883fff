/**
 * Frequency requests → the frequencies an analysis solves at: a log grid with both ends exactly, or a list sorted
 * ascending without duplicates.
 */
import type { FrequencyRequest, LogGrid } from "./types";

/** A grid point this close (relative) to the top end is the top end. */
const SAME_FREQUENCY_RELATIVE = 1e-9;

/**
 * The grid's points: `from`·10^(i/pointsPerDecade) (so decade points such as 1 kHz fall on the grid exactly when
 * `from` is a power of ten) below `to`, then `to` itself. Stops after `limit` points.
 */
function* gridPoints({ from, to, pointsPerDecade }: LogGrid, limit = Number.POSITIVE_INFINITY): Generator<number> {
  yield from;
  if (to <= from) return;
  let count = 1;
  for (let i = 1; count < limit; i += 1, count += 1) {
    const f = from * 10 ** (i / pointsPerDecade);
    if (f >= to * (1 - SAME_FREQUENCY_RELATIVE)) break;
    yield f;
  }
  yield to;
}

export function logGrid(grid: LogGrid): Float64Array {
  return Float64Array.from(gridPoints(grid));
}

/** Expands a request into a sorted, de-duplicated array of frequencies in Hz. */
export function expandFrequencies(request: FrequencyRequest): Float64Array {
  if (request.kind === "grid") return logGrid(request);
  const sorted = Float64Array.from(request.frequencies).sort();
  return sorted.filter((f, i) => i === 0 || f !== sorted[i - 1]);
}

/** How many points a request gives, counting no further than `limit` + 1 (to check a size limit cheaply). */
export function countFrequencies(request: FrequencyRequest, limit = Number.POSITIVE_INFINITY): number {
  if (request.kind === "list") return new Set(request.frequencies).size;
  let count = 0;
  for (const _ of gridPoints(request, limit + 1)) count += 1;
  return count;
}
