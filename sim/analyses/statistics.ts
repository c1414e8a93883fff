/**
 * Summary statistics of a sample, as the spread reports them for every figure: mean, sample standard deviation
 * (Bessel-corrected, n − 1; 0 for a single value), min, max and the 5th and 95th percentiles.
 *
 * Percentile definition: linear interpolation between the closest ranks, h = (n − 1)·p on the sorted values
 * x[0] ≤ … ≤ x[n−1], P = x[⌊h⌋] + (h − ⌊h⌋)·(x[⌊h⌋+1] − x[⌊h⌋]) — type 7 of Hyndman and Fan (1996), the default
 * of R's quantile() and NumPy's percentile(). Non-finite values are left out; an empty sample gives nulls.
 */
import type { FigureStatistics } from "../results";

export const LOWER_PERCENTILE = 0.05;
export const UPPER_PERCENTILE = 0.95;

/** Percentile p (0…1) of values sorted ascending (type 7). */
export function percentileOfSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) return Number.NaN;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(n - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/** Statistics of the finite values in `values`. */
export function summarise(values: ArrayLike<number>): FigureStatistics {
  // A Float64Array sorts numerically without a comparator call per pair: a spread summarises hundreds of columns.
  const all = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) all[n++] = values[i];
  if (n === 0) return { mean: null, sd: null, min: null, max: null, p5: null, p95: null };
  const finite = all.subarray(0, n).sort();
  let sum = 0;
  for (const v of finite) sum += v;
  const mean = sum / n;
  let squares = 0;
  for (const v of finite) squares += (v - mean) * (v - mean);
  const sd = n > 1 ? Math.sqrt(squares / (n - 1)) : 0;
  return {
    mean,
    sd,
    min: finite[0],
    max: finite[n - 1],
    p5: percentileOfSorted(finite, LOWER_PERCENTILE),
    p95: percentileOfSorted(finite, UPPER_PERCENTILE),
  };
}
