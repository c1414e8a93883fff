/**
 * Maximum SPL (contract; IEC 60268-4 style): the SPL at which THD at the distortion frequency reaches
 * MAX_SPL_THD_PERCENT (0.5 %, `max_spl_db`) and MAX_SPL_1PCT_THD_PERCENT (1 %, `max_spl_1pct_db`), by bisection
 * on [MAX_SPL_SEARCH_FROM_DB, MAX_SPL_SEARCH_TO_DB] to MAX_SPL_RESOLUTION_DB, THD taken as rising with level;
 * null when not reached by the top of the range. Every level's THD is kept, so the 1 % search starts from the
 * bracket the 0.5 % search already found. `max_spl_limited_by`: at the first level found at or above the 0.5 %
 * threshold, the device nearest to (or furthest past) a region boundary over the settled period.
 */
import type { LimitedBy } from "../results";
import { type DistortionSetup, distortionAtLevel, type LevelResult } from "./distortion";
import type { RunControl } from "./transient";

export const MAX_SPL_THD_PERCENT = 0.5;
export const MAX_SPL_1PCT_THD_PERCENT = 1;
export const MAX_SPL_SEARCH_FROM_DB = 40;
export const MAX_SPL_SEARCH_TO_DB = 160;
export const MAX_SPL_RESOLUTION_DB = 0.1;

export interface MaxSplResult {
  max_spl_db: number | null;
  max_spl_1pct_db: number | null;
  max_spl_limited_by: LimitedBy | null;
  /** levels evaluated (dB SPL) */
  evaluations: number;
}

export function findMaxSpl(setup: DistortionSetup, control: RunControl = {}): MaxSplResult {
  const cache = new Map<number, LevelResult>();
  const total = 2 * Math.ceil(Math.log2((MAX_SPL_SEARCH_TO_DB - MAX_SPL_SEARCH_FROM_DB) / MAX_SPL_RESOLUTION_DB) + 1);
  const at = (spl: number): LevelResult => {
    const key = Math.round(spl * 1e6) / 1e6;
    let r = cache.get(key);
    if (!r) {
      const done = cache.size;
      r = distortionAtLevel(setup, key, { shouldStop: control.shouldStop });
      cache.set(key, r);
      control.onProgress?.(Math.min(1, (done + 1) / total));
    }
    return r;
  };
  const search = (threshold: number): number | null => {
    // the tightest bracket the evaluations so far give
    let lo = MAX_SPL_SEARCH_FROM_DB;
    let hi = MAX_SPL_SEARCH_TO_DB;
    for (const [spl, r] of cache) {
      if (r.figures.thd_percent >= threshold) hi = Math.min(hi, spl);
      else lo = Math.max(lo, spl);
    }
    if (lo >= hi) return hi;
    while (hi - lo > MAX_SPL_RESOLUTION_DB) {
      const mid = (lo + hi) / 2;
      if (at(mid).figures.thd_percent >= threshold) hi = mid;
      else lo = mid;
    }
    if (at(hi).figures.thd_percent < threshold) return null; // not reached by the top of the range
    if (lo === MAX_SPL_SEARCH_FROM_DB && at(lo).figures.thd_percent >= threshold) return lo;
    return (lo + hi) / 2;
  };
  const half = search(MAX_SPL_THD_PERCENT);
  const one = search(MAX_SPL_1PCT_THD_PERCENT);
  let limitedBy: LimitedBy | null = null;
  if (half !== null) {
    let first: LevelResult | null = null;
    let firstSpl = Number.POSITIVE_INFINITY;
    for (const [spl, r] of cache) {
      if (r.figures.thd_percent >= MAX_SPL_THD_PERCENT && spl < firstSpl) {
        firstSpl = spl;
        first = r;
      }
    }
    if (first?.limit) {
      const { reason, detail } = first.limit.margin;
      limitedBy =
        detail === undefined ? { part: first.limit.part, reason } : { part: first.limit.part, reason, detail };
    }
  }
  return { max_spl_db: half, max_spl_1pct_db: one, max_spl_limited_by: limitedBy, evaluations: cache.size };
}
