/**
 * Band corners (contract): where |H(f)| = |H(1 kHz)|/√2, the first crossing going outward from 1 kHz, found to
 * 0.1 % by root-finding on the response itself. Outward from 1 kHz the response is sampled on a log grid of
 * CORNER_SEARCH_POINTS_PER_DECADE points per decade until it first falls below the target; the bracket is then
 * bisected in log-frequency, re-solving the circuit at each trial, until its ends differ by less than
 * CORNER_RELATIVE_TOLERANCE. No crossing inside CORNER_LOWEST_HZ … CORNER_HIGHEST_HZ gives null.
 */
export const REFERENCE_FREQUENCY_HZ = 1000;
export const CORNER_LOWEST_HZ = 0.1;
export const CORNER_HIGHEST_HZ = 1e6;
export const CORNER_SEARCH_POINTS_PER_DECADE = 20;
/** bracket width at which the bisection stops: 0.01 %, ten times tighter than the 0.1 % the contract asks */
export const CORNER_RELATIVE_TOLERANCE = 1e-4;

/**
 * First frequency going from 1 kHz towards `limit` where magnitude(f) crosses `target` (from above), or null.
 * `magnitude` re-solves the circuit at its argument.
 */
export function findCorner(magnitude: (f: number) => number, target: number, limit: number): number | null {
  if (!(target > 0) || !Number.isFinite(target)) return null;
  const direction = limit < REFERENCE_FREQUENCY_HZ ? -1 : 1;
  const ratio = 10 ** (direction / CORNER_SEARCH_POINTS_PER_DECADE);
  let inside = REFERENCE_FREQUENCY_HZ;
  while (true) {
    let outside = inside * ratio;
    const beyond = direction < 0 ? outside <= limit : outside >= limit;
    if (beyond) outside = limit;
    const m = magnitude(outside);
    if (m < target) return bisect(magnitude, target, inside, outside);
    if (beyond) return null;
    inside = outside;
  }
}

function bisect(magnitude: (f: number) => number, target: number, inside: number, outside: number): number {
  let a = inside; // |H| ≥ target
  let b = outside; // |H| < target
  while (Math.abs(b / a - 1) > CORNER_RELATIVE_TOLERANCE) {
    const mid = Math.sqrt(a * b);
    if (magnitude(mid) >= target) a = mid;
    else b = mid;
  }
  return Math.sqrt(a * b);
}
