/**
 * The complex sparse LU of sparse-lu-complex.ts run on SWEEP_LANES frequencies at once, for frequency sweeps.
 *
 * Why lanes: with static pivots the elimination is one fixed sequence of dependent steps (each pivot waits for the
 * updates of the rows before it, each back-substitution for the unknowns after it), so factoring one frequency at
 * a time is bound by the latency of that chain, not by arithmetic — on a ladder network every step depends on the
 * previous one. Different frequencies of the same matrix share the whole elimination program but none of the
 * data, so interleaving SWEEP_LANES of them (value k of lane b stored at k·SWEEP_LANES + b) lets the processor
 * overlap the independent chains, and every index array is read once for all lanes.
 *
 * Per lane the arithmetic is exactly that of SparseLuComplex (same operations in the same order), so a lane's
 * solution is the one the single-frequency solver gives; the one difference is that a zero multiplier is not
 * skipped (it changes nothing but the sign of a zero). A lane whose static pivot is too small for its row is
 * reported in the returned bit mask and its numbers are meaningless: the caller re-solves that frequency with the
 * single-frequency system (dense fallback). Typed arrays only; no allocation after construction.
 */
import { STATIC_PIVOT_RELATIVE_TOLERANCE } from "./pivot-tolerance";
import type { SparseStructure } from "./sparse-structure";

/**
 * Frequencies factored together. Four independent chains are enough to hide the latency of the dependent
 * multiply–subtract–divide sequence on current x86 and ARM cores, while a lane group of one position (4 × 16
 * bytes, real and imaginary) still shares a cache line pair.
 */
export const SWEEP_LANES = 4;

/** Bit mask with every lane set. */
export const ALL_LANES = (1 << SWEEP_LANES) - 1;

/** log2(SWEEP_LANES): lane-group offsets are computed with a shift. The kernels below are written for 4 lanes. */
const LANE_SHIFT = 2;

/** Which elimination steps a restricted solve visits (outputPlan): forward in increasing, back in decreasing order. */
export interface OutputPlan {
  forwardSteps: Int32Array;
  backSteps: Int32Array;
}

export class SparseLuComplexLanes {
  readonly structure: SparseStructure;
  /** factor values, lane-interleaved: position k of lane b at k·SWEEP_LANES + b */
  readonly re: Float64Array;
  readonly im: Float64Array;
  private readonly inversePivotRe: Float64Array;
  private readonly inversePivotIm: Float64Array;
  private readonly workRe: Float64Array;
  private readonly workIm: Float64Array;
  /** elimination step (permuted column) of each original unknown */
  private readonly stepOfUnknown: Int32Array;

  constructor(structure: SparseStructure) {
    this.structure = structure;
    this.stepOfUnknown = new Int32Array(structure.size);
    for (let q = 0; q < structure.size; q++) this.stepOfUnknown[structure.originalColumnOf[q]] = q;
    this.re = new Float64Array((structure.nnz + 1) * SWEEP_LANES);
    this.im = new Float64Array((structure.nnz + 1) * SWEEP_LANES);
    this.inversePivotRe = new Float64Array(structure.size * SWEEP_LANES);
    this.inversePivotIm = new Float64Array(structure.size * SWEEP_LANES);
    this.workRe = new Float64Array(structure.size * SWEEP_LANES);
    this.workIm = new Float64Array(structure.size * SWEEP_LANES);
  }

  /**
   * Load A(ω_b) = conductance + j·ω_b·reactance for the SWEEP_LANES angular frequencies `omegas` (rad/s) and
   * factor all of them, row by row as SparseLuComplex.factorAt does. Returns the bit mask of the lanes whose
   * static pivots failed (0 when every lane is usable).
   */
  factorAt(conductance: Float64Array, reactance: Float64Array, omegas: ArrayLike<number>): number {
    const s = this.structure;
    const re = this.re;
    const im = this.im;
    const { rowStart, diagonalPosition, eliminationStart, multiplierPosition, pivotRow } = s;
    const { updateStart, updateSource, updateTarget } = s;
    const invRe = this.inversePivotRe;
    const invIm = this.inversePivotIm;
    // The four lanes are written out (…0 … …3) rather than looped over: an inner loop of four would cost as much
    // in loop control as the arithmetic it runs, and the point of the lanes is to keep the arithmetic units busy.
    const w0 = omegas[0];
    const w1 = omegas[1];
    const w2 = omegas[2];
    const w3 = omegas[3];
    const tol2 = STATIC_PIVOT_RELATIVE_TOLERANCE * STATIC_PIVOT_RELATIVE_TOLERANCE;
    let failed = 0;
    const n = s.size;
    for (let i = 0; i < n; i++) {
      let m0 = 0;
      let m1 = 0;
      let m2 = 0;
      let m3 = 0;
      const end = rowStart[i + 1];
      for (let k = rowStart[i]; k < end; k++) {
        const r = conductance[k];
        const c = reactance[k];
        const at = k << LANE_SHIFT;
        const x0 = w0 * c;
        const x1 = w1 * c;
        const x2 = w2 * c;
        const x3 = w3 * c;
        re[at] = r;
        re[at + 1] = r;
        re[at + 2] = r;
        re[at + 3] = r;
        im[at] = x0;
        im[at + 1] = x1;
        im[at + 2] = x2;
        im[at + 3] = x3;
        const r2 = r * r;
        const a0 = r2 + x0 * x0;
        const a1 = r2 + x1 * x1;
        const a2 = r2 + x2 * x2;
        const a3 = r2 + x3 * x3;
        // Math.max rather than a compare-and-branch: which entry is largest varies with frequency.
        m0 = Math.max(m0, a0);
        m1 = Math.max(m1, a1);
        m2 = Math.max(m2, a2);
        m3 = Math.max(m3, a3);
      }
      const lastElimination = eliminationStart[i + 1];
      for (let e = eliminationStart[i]; e < lastElimination; e++) {
        const m = multiplierPosition[e] << LANE_SHIFT;
        const p = pivotRow[e] << LANE_SHIFT;
        const ar0 = re[m];
        const ai0 = im[m];
        const ar1 = re[m + 1];
        const ai1 = im[m + 1];
        const ar2 = re[m + 2];
        const ai2 = im[m + 2];
        const ar3 = re[m + 3];
        const ai3 = im[m + 3];
        const l0r = ar0 * invRe[p] - ai0 * invIm[p];
        const l0i = ar0 * invIm[p] + ai0 * invRe[p];
        const l1r = ar1 * invRe[p + 1] - ai1 * invIm[p + 1];
        const l1i = ar1 * invIm[p + 1] + ai1 * invRe[p + 1];
        const l2r = ar2 * invRe[p + 2] - ai2 * invIm[p + 2];
        const l2i = ar2 * invIm[p + 2] + ai2 * invRe[p + 2];
        const l3r = ar3 * invRe[p + 3] - ai3 * invIm[p + 3];
        const l3i = ar3 * invIm[p + 3] + ai3 * invRe[p + 3];
        re[m] = l0r;
        im[m] = l0i;
        re[m + 1] = l1r;
        im[m + 1] = l1i;
        re[m + 2] = l2r;
        im[m + 2] = l2i;
        re[m + 3] = l3r;
        im[m + 3] = l3i;
        const lastUpdate = updateStart[e + 1];
        for (let u = updateStart[e]; u < lastUpdate; u++) {
          const src = updateSource[u] << LANE_SHIFT;
          const dst = updateTarget[u] << LANE_SHIFT;
          const s0r = re[src];
          const s0i = im[src];
          const s1r = re[src + 1];
          const s1i = im[src + 1];
          const s2r = re[src + 2];
          const s2i = im[src + 2];
          const s3r = re[src + 3];
          const s3i = im[src + 3];
          re[dst] -= l0r * s0r - l0i * s0i;
          im[dst] -= l0r * s0i + l0i * s0r;
          re[dst + 1] -= l1r * s1r - l1i * s1i;
          im[dst + 1] -= l1r * s1i + l1i * s1r;
          re[dst + 2] -= l2r * s2r - l2i * s2i;
          im[dst + 2] -= l2r * s2i + l2i * s2r;
          re[dst + 3] -= l3r * s3r - l3i * s3i;
          im[dst + 3] -= l3r * s3i + l3i * s3r;
        }
      }
      const d = diagonalPosition[i] << LANE_SHIFT;
      const at = i << LANE_SHIFT;
      failed |= this.invertPivot(re[d], im[d], m0, tol2, at) ? 0 : 1;
      failed |= this.invertPivot(re[d + 1], im[d + 1], m1, tol2, at + 1) ? 0 : 2;
      failed |= this.invertPivot(re[d + 2], im[d + 2], m2, tol2, at + 2) ? 0 : 4;
      failed |= this.invertPivot(re[d + 3], im[d + 3], m3, tol2, at + 3) ? 0 : 8;
    }
    return failed;
  }

  /** Store 1/pivot at slot `at`; false when the pivot is too small for its row (largest |entry|² rowMax2). */
  private invertPivot(pr: number, pi: number, rowMax2: number, tol2: number, at: number): boolean {
    const mag2 = pr * pr + pi * pi;
    const inverseMag2 = 1 / mag2;
    this.inversePivotRe[at] = pr * inverseMag2;
    this.inversePivotIm[at] = -pi * inverseMag2;
    return rowMax2 > 0 && !(mag2 < tol2 * rowMax2);
  }

  /**
   * Solve every lane with its factors. Right-hand sides are lane-interleaved in original row order: row r of lane
   * b at r·SWEEP_LANES + b (the arrays may be longer, e.g. a ground scratch row). The solution stays in the
   * solver's own order — a sweep reads only its output unknowns (solutionRe/solutionIm), so scattering all of
   * them back would be wasted work; copySolution gives the whole vector.
   */
  solve(rhsRe: Float64Array, rhsIm: Float64Array): void {
    const s = this.structure;
    const re = this.re;
    const im = this.im;
    const wr = this.workRe;
    const wi = this.workIm;
    const { rowStart, columnOf, diagonalPosition, originalRowOf } = s;
    const n = s.size;
    // Forward substitution with the unit lower factor, each lane's running sums kept in registers.
    for (let p = 0; p < n; p++) {
      const from = originalRowOf[p] << LANE_SHIFT;
      let s0r = rhsRe[from];
      let s0i = rhsIm[from];
      let s1r = rhsRe[from + 1];
      let s1i = rhsIm[from + 1];
      let s2r = rhsRe[from + 2];
      let s2i = rhsIm[from + 2];
      let s3r = rhsRe[from + 3];
      let s3i = rhsIm[from + 3];
      const diagonal = diagonalPosition[p];
      for (let k = rowStart[p]; k < diagonal; k++) {
        const c = columnOf[k] << LANE_SHIFT;
        const kk = k << LANE_SHIFT;
        s0r -= re[kk] * wr[c] - im[kk] * wi[c];
        s0i -= re[kk] * wi[c] + im[kk] * wr[c];
        s1r -= re[kk + 1] * wr[c + 1] - im[kk + 1] * wi[c + 1];
        s1i -= re[kk + 1] * wi[c + 1] + im[kk + 1] * wr[c + 1];
        s2r -= re[kk + 2] * wr[c + 2] - im[kk + 2] * wi[c + 2];
        s2i -= re[kk + 2] * wi[c + 2] + im[kk + 2] * wr[c + 2];
        s3r -= re[kk + 3] * wr[c + 3] - im[kk + 3] * wi[c + 3];
        s3i -= re[kk + 3] * wi[c + 3] + im[kk + 3] * wr[c + 3];
      }
      const at = p << LANE_SHIFT;
      wr[at] = s0r;
      wi[at] = s0i;
      wr[at + 1] = s1r;
      wi[at + 1] = s1i;
      wr[at + 2] = s2r;
      wi[at + 2] = s2i;
      wr[at + 3] = s3r;
      wi[at + 3] = s3i;
    }
    const invRe = this.inversePivotRe;
    const invIm = this.inversePivotIm;
    // Back substitution with the upper factor, then the multiplication by the inverse pivot.
    for (let p = n - 1; p >= 0; p--) {
      const at = p << LANE_SHIFT;
      let s0r = wr[at];
      let s0i = wi[at];
      let s1r = wr[at + 1];
      let s1i = wi[at + 1];
      let s2r = wr[at + 2];
      let s2i = wi[at + 2];
      let s3r = wr[at + 3];
      let s3i = wi[at + 3];
      const end = rowStart[p + 1];
      for (let k = diagonalPosition[p] + 1; k < end; k++) {
        const c = columnOf[k] << LANE_SHIFT;
        const kk = k << LANE_SHIFT;
        s0r -= re[kk] * wr[c] - im[kk] * wi[c];
        s0i -= re[kk] * wi[c] + im[kk] * wr[c];
        s1r -= re[kk + 1] * wr[c + 1] - im[kk + 1] * wi[c + 1];
        s1i -= re[kk + 1] * wi[c + 1] + im[kk + 1] * wr[c + 1];
        s2r -= re[kk + 2] * wr[c + 2] - im[kk + 2] * wi[c + 2];
        s2i -= re[kk + 2] * wi[c + 2] + im[kk + 2] * wr[c + 2];
        s3r -= re[kk + 3] * wr[c + 3] - im[kk + 3] * wi[c + 3];
        s3i -= re[kk + 3] * wi[c + 3] + im[kk + 3] * wr[c + 3];
      }
      wr[at] = s0r * invRe[at] - s0i * invIm[at];
      wi[at] = s0r * invIm[at] + s0i * invRe[at];
      wr[at + 1] = s1r * invRe[at + 1] - s1i * invIm[at + 1];
      wi[at + 1] = s1r * invIm[at + 1] + s1i * invRe[at + 1];
      wr[at + 2] = s2r * invRe[at + 2] - s2i * invIm[at + 2];
      wi[at + 2] = s2r * invIm[at + 2] + s2i * invRe[at + 2];
      wr[at + 3] = s3r * invRe[at + 3] - s3i * invIm[at + 3];
      wi[at + 3] = s3r * invIm[at + 3] + s3i * invRe[at + 3];
    }
  }

  /**
   * The steps a solve must visit to give `unknowns` (original order) and nothing else. Back substitution at a
   * step reads the solution at the later steps its upper-factor row names, so the back steps are the closure of
   * the wanted steps under the upper factor; forward substitution at a step reads the earlier steps its
   * lower-factor row names, so the forward steps are the closure of the back steps under the lower factor.
   * A sweep reads one or two unknowns, and on a circuit's matrix those closures are usually a fraction of it.
   */
  outputPlan(unknowns: readonly number[]): OutputPlan {
    const s = this.structure;
    const { rowStart, columnOf, diagonalPosition } = s;
    const back = new Uint8Array(s.size);
    const pending: number[] = [];
    for (const u of unknowns) {
      const q = this.stepOfUnknown[u];
      if (!back[q]) {
        back[q] = 1;
        pending.push(q);
      }
    }
    while (pending.length > 0) {
      const p = pending.pop()!;
      for (let k = diagonalPosition[p] + 1; k < rowStart[p + 1]; k++) {
        const c = columnOf[k];
        if (!back[c]) {
          back[c] = 1;
          pending.push(c);
        }
      }
    }
    const forward = back.slice();
    for (let p = 0; p < s.size; p++) if (forward[p]) pending.push(p);
    while (pending.length > 0) {
      const p = pending.pop()!;
      for (let k = rowStart[p]; k < diagonalPosition[p]; k++) {
        const c = columnOf[k];
        if (!forward[c]) {
          forward[c] = 1;
          pending.push(c);
        }
      }
    }
    const steps = (marked: Uint8Array) => {
      const out: number[] = [];
      for (let p = 0; p < s.size; p++) if (marked[p]) out.push(p);
      return Int32Array.from(out);
    };
    return { forwardSteps: steps(forward), backSteps: steps(back).reverse() };
  }

  /**
   * `solve` restricted to a plan's steps: afterwards solutionRe/solutionIm are valid for the plan's unknowns
   * only. Each visited step does exactly the arithmetic `solve` does there, so those unknowns come out the same.
   */
  solvePlanned(rhsRe: Float64Array, rhsIm: Float64Array, plan: OutputPlan): void {
    const s = this.structure;
    const re = this.re;
    const im = this.im;
    const wr = this.workRe;
    const wi = this.workIm;
    const { rowStart, columnOf, diagonalPosition, originalRowOf } = s;
    const { forwardSteps, backSteps } = plan;
    for (let j = 0; j < forwardSteps.length; j++) {
      const p = forwardSteps[j];
      const from = originalRowOf[p] << LANE_SHIFT;
      let s0r = rhsRe[from];
      let s0i = rhsIm[from];
      let s1r = rhsRe[from + 1];
      let s1i = rhsIm[from + 1];
      let s2r = rhsRe[from + 2];
      let s2i = rhsIm[from + 2];
      let s3r = rhsRe[from + 3];
      let s3i = rhsIm[from + 3];
      const diagonal = diagonalPosition[p];
      for (let k = rowStart[p]; k < diagonal; k++) {
        const c = columnOf[k] << LANE_SHIFT;
        const kk = k << LANE_SHIFT;
        s0r -= re[kk] * wr[c] - im[kk] * wi[c];
        s0i -= re[kk] * wi[c] + im[kk] * wr[c];
        s1r -= re[kk + 1] * wr[c + 1] - im[kk + 1] * wi[c + 1];
        s1i -= re[kk + 1] * wi[c + 1] + im[kk + 1] * wr[c + 1];
        s2r -= re[kk + 2] * wr[c + 2] - im[kk + 2] * wi[c + 2];
        s2i -= re[kk + 2] * wi[c + 2] + im[kk + 2] * wr[c + 2];
        s3r -= re[kk + 3] * wr[c + 3] - im[kk + 3] * wi[c + 3];
        s3i -= re[kk + 3] * wi[c + 3] + im[kk + 3] * wr[c + 3];
      }
      const at = p << LANE_SHIFT;
      wr[at] = s0r;
      wi[at] = s0i;
      wr[at + 1] = s1r;
      wi[at + 1] = s1i;
      wr[at + 2] = s2r;
      wi[at + 2] = s2i;
      wr[at + 3] = s3r;
      wi[at + 3] = s3i;
    }
    const invRe = this.inversePivotRe;
    const invIm = this.inversePivotIm;
    for (let j = 0; j < backSteps.length; j++) {
      const p = backSteps[j];
      const at = p << LANE_SHIFT;
      let s0r = wr[at];
      let s0i = wi[at];
      let s1r = wr[at + 1];
      let s1i = wi[at + 1];
      let s2r = wr[at + 2];
      let s2i = wi[at + 2];
      let s3r = wr[at + 3];
      let s3i = wi[at + 3];
      const end = rowStart[p + 1];
      for (let k = diagonalPosition[p] + 1; k < end; k++) {
        const c = columnOf[k] << LANE_SHIFT;
        const kk = k << LANE_SHIFT;
        s0r -= re[kk] * wr[c] - im[kk] * wi[c];
        s0i -= re[kk] * wi[c] + im[kk] * wr[c];
        s1r -= re[kk + 1] * wr[c + 1] - im[kk + 1] * wi[c + 1];
        s1i -= re[kk + 1] * wi[c + 1] + im[kk + 1] * wr[c + 1];
        s2r -= re[kk + 2] * wr[c + 2] - im[kk + 2] * wi[c + 2];
        s2i -= re[kk + 2] * wi[c + 2] + im[kk + 2] * wr[c + 2];
        s3r -= re[kk + 3] * wr[c + 3] - im[kk + 3] * wi[c + 3];
        s3i -= re[kk + 3] * wi[c + 3] + im[kk + 3] * wr[c + 3];
      }
      wr[at] = s0r * invRe[at] - s0i * invIm[at];
      wi[at] = s0r * invIm[at] + s0i * invRe[at];
      wr[at + 1] = s1r * invRe[at + 1] - s1i * invIm[at + 1];
      wi[at + 1] = s1r * invIm[at + 1] + s1i * invRe[at + 1];
      wr[at + 2] = s2r * invRe[at + 2] - s2i * invIm[at + 2];
      wi[at + 2] = s2r * invIm[at + 2] + s2i * invRe[at + 2];
      wr[at + 3] = s3r * invRe[at + 3] - s3i * invIm[at + 3];
      wi[at + 3] = s3r * invIm[at + 3] + s3i * invRe[at + 3];
    }
  }

  /** Unknown `unknown` (original order) of lane `lane` from the last solve: real part. */
  solutionRe(unknown: number, lane: number): number {
    return this.workRe[(this.stepOfUnknown[unknown] << LANE_SHIFT) + lane];
  }

  /** Unknown `unknown` (original order) of lane `lane` from the last solve: imaginary part. */
  solutionIm(unknown: number, lane: number): number {
    return this.workIm[(this.stepOfUnknown[unknown] << LANE_SHIFT) + lane];
  }

  /** The whole solution of the last solve, lane-interleaved in original unknown order (row r of lane b at r·4 + b). */
  copySolution(solRe: Float64Array, solIm: Float64Array): void {
    const { originalColumnOf, size } = this.structure;
    const wr = this.workRe;
    const wi = this.workIm;
    for (let q = 0; q < size; q++) {
      const to = originalColumnOf[q] << LANE_SHIFT;
      const at = q << LANE_SHIFT;
      for (let b = 0; b < SWEEP_LANES; b++) {
        solRe[to + b] = wr[at + b];
        solIm[to + b] = wi[at + b];
      }
    }
  }
}
