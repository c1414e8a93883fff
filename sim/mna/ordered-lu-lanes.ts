/**
 * The ordered LU of ordered-lu.ts run on SWEEP_LANES matrices at once that share one plan (row order and pattern)
 * — the reduced systems of a Monte Carlo run at neighbouring frequencies (sim/analyses/spread-sweep.ts).
 *
 * Why lanes: the reduced systems are small (the demo's is 7 × 7 with about twenty entries), so one at a time the
 * loop control and index loads cost as much as the arithmetic, and every step waits for the one before it.
 * Interleaving four independent systems (entry `at` of lane b stored at at·SWEEP_LANES + b, as in
 * sparse-lu-complex-lanes.ts) reads each index once for four lanes and gives the processor four independent
 * chains. Per lane the arithmetic is exactly OrderedLu's; a lane whose pivot fails the check is reported in the
 * returned bit mask and its numbers are meaningless.
 */
import { STATIC_PIVOT_RELATIVE_TOLERANCE } from "./pivot-tolerance";
import type { OrderedLuPlan } from "./ordered-lu";
import { SWEEP_LANES } from "./sparse-lu-complex-lanes";

/** log2(SWEEP_LANES); the kernels below are written out for 4 lanes. */
const LANE_SHIFT = 2;

export class OrderedLuLanes {
  readonly size: number;
  /** lane-interleaved k × k values: entry `at` of lane b at at·SWEEP_LANES + b */
  readonly re: Float64Array;
  readonly im: Float64Array;
  private plan: OrderedLuPlan | null = null;
  private readonly inverseRe: Float64Array;
  private readonly inverseIm: Float64Array;
  private readonly workRe: Float64Array;
  private readonly workIm: Float64Array;

  constructor(size: number) {
    this.size = size;
    this.re = new Float64Array(size * size * SWEEP_LANES);
    this.im = new Float64Array(size * size * SWEEP_LANES);
    this.inverseRe = new Float64Array(size * SWEEP_LANES);
    this.inverseIm = new Float64Array(size * SWEEP_LANES);
    this.workRe = new Float64Array(size * SWEEP_LANES);
    this.workIm = new Float64Array(size * SWEEP_LANES);
  }

  /** Factor every lane by `plan`; returns the bit mask of lanes whose pivots failed (0 when all are usable). */
  factor(plan: OrderedLuPlan): number {
    const n = this.size;
    const { re, im } = this;
    const { pivotAt, pivotRowStart, pivotRowEntries, eliminationStart, multiplierAt } = plan;
    const { updateStart, updateSource, updateTarget } = plan;
    this.plan = plan;
    let failed = 0;
    for (let c = 0; c < n; c++) {
      let m0 = 0;
      let m1 = 0;
      let m2 = 0;
      let m3 = 0;
      for (let q = pivotRowStart[c]; q < pivotRowStart[c + 1]; q++) {
        const a = pivotRowEntries[q] << LANE_SHIFT;
        m0 = Math.max(m0, re[a] * re[a] + im[a] * im[a]);
        m1 = Math.max(m1, re[a + 1] * re[a + 1] + im[a + 1] * im[a + 1]);
        m2 = Math.max(m2, re[a + 2] * re[a + 2] + im[a + 2] * im[a + 2]);
        m3 = Math.max(m3, re[a + 3] * re[a + 3] + im[a + 3] * im[a + 3]);
      }
      const p = pivotAt[c] << LANE_SHIFT;
      const at = c << LANE_SHIFT;
      failed |= this.invertPivot(re[p], im[p], m0, at) ? 0 : 1;
      failed |= this.invertPivot(re[p + 1], im[p + 1], m1, at + 1) ? 0 : 2;
      failed |= this.invertPivot(re[p + 2], im[p + 2], m2, at + 2) ? 0 : 4;
      failed |= this.invertPivot(re[p + 3], im[p + 3], m3, at + 3) ? 0 : 8;
      const invRe = this.inverseRe;
      const invIm = this.inverseIm;
      for (let e = eliminationStart[c]; e < eliminationStart[c + 1]; e++) {
        const m = multiplierAt[e] << LANE_SHIFT;
        const l0r = re[m] * invRe[at] - im[m] * invIm[at];
        const l0i = re[m] * invIm[at] + im[m] * invRe[at];
        const l1r = re[m + 1] * invRe[at + 1] - im[m + 1] * invIm[at + 1];
        const l1i = re[m + 1] * invIm[at + 1] + im[m + 1] * invRe[at + 1];
        const l2r = re[m + 2] * invRe[at + 2] - im[m + 2] * invIm[at + 2];
        const l2i = re[m + 2] * invIm[at + 2] + im[m + 2] * invRe[at + 2];
        const l3r = re[m + 3] * invRe[at + 3] - im[m + 3] * invIm[at + 3];
        const l3i = re[m + 3] * invIm[at + 3] + im[m + 3] * invRe[at + 3];
        re[m] = l0r;
        im[m] = l0i;
        re[m + 1] = l1r;
        im[m + 1] = l1i;
        re[m + 2] = l2r;
        im[m + 2] = l2i;
        re[m + 3] = l3r;
        im[m + 3] = l3i;
        for (let u = updateStart[e]; u < updateStart[e + 1]; u++) {
          const src = updateSource[u] << LANE_SHIFT;
          const dst = updateTarget[u] << LANE_SHIFT;
          re[dst] -= l0r * re[src] - l0i * im[src];
          im[dst] -= l0r * im[src] + l0i * re[src];
          re[dst + 1] -= l1r * re[src + 1] - l1i * im[src + 1];
          im[dst + 1] -= l1r * im[src + 1] + l1i * re[src + 1];
          re[dst + 2] -= l2r * re[src + 2] - l2i * im[src + 2];
          im[dst + 2] -= l2r * im[src + 2] + l2i * re[src + 2];
          re[dst + 3] -= l3r * re[src + 3] - l3i * im[src + 3];
          im[dst + 3] -= l3r * im[src + 3] + l3i * re[src + 3];
        }
      }
    }
    return failed;
  }

  /** Store 1/pivot at slot `at`; false when the pivot is zero or too small for its row (largest |entry|² rowMax2). */
  private invertPivot(pr: number, pi: number, rowMax2: number, at: number): boolean {
    const mag2 = pr * pr + pi * pi;
    this.inverseRe[at] = pr / mag2;
    this.inverseIm[at] = -pi / mag2;
    const tol = STATIC_PIVOT_RELATIVE_TOLERANCE;
    return mag2 > 0 && !(mag2 < tol * tol * rowMax2);
  }

  /** Solve every lane; right-hand sides and solutions lane-interleaved (unknown i of lane b at i·SWEEP_LANES + b). */
  solve(rhsRe: Float64Array, rhsIm: Float64Array, solRe: Float64Array, solIm: Float64Array): void {
    const n = this.size;
    const { re, im, inverseRe, inverseIm, workRe: wr, workIm: wi } = this;
    const { order, lowerStart, lowerAt, lowerColumn, upperStart, upperAt, upperColumn } = this.plan!;
    for (let c = 0; c < n; c++) {
      const from = order[c] << LANE_SHIFT;
      let s0r = rhsRe[from];
      let s0i = rhsIm[from];
      let s1r = rhsRe[from + 1];
      let s1i = rhsIm[from + 1];
      let s2r = rhsRe[from + 2];
      let s2i = rhsIm[from + 2];
      let s3r = rhsRe[from + 3];
      let s3i = rhsIm[from + 3];
      for (let q = lowerStart[c]; q < lowerStart[c + 1]; q++) {
        const a = lowerAt[q] << LANE_SHIFT;
        const j = lowerColumn[q] << LANE_SHIFT;
        s0r -= re[a] * wr[j] - im[a] * wi[j];
        s0i -= re[a] * wi[j] + im[a] * wr[j];
        s1r -= re[a + 1] * wr[j + 1] - im[a + 1] * wi[j + 1];
        s1i -= re[a + 1] * wi[j + 1] + im[a + 1] * wr[j + 1];
        s2r -= re[a + 2] * wr[j + 2] - im[a + 2] * wi[j + 2];
        s2i -= re[a + 2] * wi[j + 2] + im[a + 2] * wr[j + 2];
        s3r -= re[a + 3] * wr[j + 3] - im[a + 3] * wi[j + 3];
        s3i -= re[a + 3] * wi[j + 3] + im[a + 3] * wr[j + 3];
      }
      const at = c << LANE_SHIFT;
      wr[at] = s0r;
      wi[at] = s0i;
      wr[at + 1] = s1r;
      wi[at + 1] = s1i;
      wr[at + 2] = s2r;
      wi[at + 2] = s2i;
      wr[at + 3] = s3r;
      wi[at + 3] = s3i;
    }
    for (let c = n - 1; c >= 0; c--) {
      const at = c << LANE_SHIFT;
      let s0r = wr[at];
      let s0i = wi[at];
      let s1r = wr[at + 1];
      let s1i = wi[at + 1];
      let s2r = wr[at + 2];
      let s2i = wi[at + 2];
      let s3r = wr[at + 3];
      let s3i = wi[at + 3];
      for (let q = upperStart[c]; q < upperStart[c + 1]; q++) {
        const a = upperAt[q] << LANE_SHIFT;
        const j = upperColumn[q] << LANE_SHIFT;
        s0r -= re[a] * solRe[j] - im[a] * solIm[j];
        s0i -= re[a] * solIm[j] + im[a] * solRe[j];
        s1r -= re[a + 1] * solRe[j + 1] - im[a + 1] * solIm[j + 1];
        s1i -= re[a + 1] * solIm[j + 1] + im[a + 1] * solRe[j + 1];
        s2r -= re[a + 2] * solRe[j + 2] - im[a + 2] * solIm[j + 2];
        s2i -= re[a + 2] * solIm[j + 2] + im[a + 2] * solRe[j + 2];
        s3r -= re[a + 3] * solRe[j + 3] - im[a + 3] * solIm[j + 3];
        s3i -= re[a + 3] * solIm[j + 3] + im[a + 3] * solRe[j + 3];
      }
      solRe[at] = s0r * inverseRe[at] - s0i * inverseIm[at];
      solIm[at] = s0r * inverseIm[at] + s0i * inverseRe[at];
      solRe[at + 1] = s1r * inverseRe[at + 1] - s1i * inverseIm[at + 1];
      solIm[at + 1] = s1r * inverseIm[at + 1] + s1i * inverseRe[at + 1];
      solRe[at + 2] = s2r * inverseRe[at + 2] - s2i * inverseIm[at + 2];
      solIm[at + 2] = s2r * inverseIm[at + 2] + s2i * inverseRe[at + 2];
      solRe[at + 3] = s3r * inverseRe[at + 3] - s3i * inverseIm[at + 3];
      solIm[at + 3] = s3r * inverseIm[at + 3] + s3i * inverseRe[at + 3];
    }
  }
}
