/**
 * Numeric sparse LU of a complex system (the AC matrix at one frequency) on a compiled structure, with real and
 * imaginary parts in separate typed arrays. `factorAt` builds G + jωC from two precomputed coefficient arrays
 * while it eliminates, so a frequency costs one pass over the positions plus the elimination program, and each
 * right-hand side two triangular solves: no allocation, no look-ups.
 */
import { STATIC_PIVOT_RELATIVE_TOLERANCE } from "./pivot-tolerance";
import type { SparseStructure } from "./sparse-structure";

export class SparseLuComplex {
  readonly structure: SparseStructure;
  readonly re: Float64Array;
  readonly im: Float64Array;
  private readonly inversePivotRe: Float64Array;
  private readonly inversePivotIm: Float64Array;
  private readonly workRe: Float64Array;
  private readonly workIm: Float64Array;

  constructor(structure: SparseStructure) {
    this.structure = structure;
    this.re = new Float64Array(structure.nnz + 1);
    this.im = new Float64Array(structure.nnz + 1);
    this.inversePivotRe = new Float64Array(structure.size);
    this.inversePivotIm = new Float64Array(structure.size);
    this.workRe = new Float64Array(structure.size);
    this.workIm = new Float64Array(structure.size);
  }

  /** values = conductance + j·omega·reactance (both by storage position; fill positions hold 0) */
  loadAtFrequency(conductance: Float64Array, reactance: Float64Array, omega: number): void {
    const re = this.re;
    const im = this.im;
    for (let k = 0; k < re.length; k++) {
      re[k] = conductance[k];
      im[k] = omega * reactance[k];
    }
  }

  /**
   * Load A(ω) = conductance + j·omega·reactance and factor it in place, row by row. Row-wise elimination only
   * writes the row being processed, so each row is loaded just before its turn: one pass over the positions
   * does the load, the row scale for the pivot test and the elimination. False when a static pivot is too
   * small for its row (use the dense fallback).
   */
  factorAt(conductance: Float64Array, reactance: Float64Array, omega: number): boolean {
    const s = this.structure;
    const re = this.re;
    const im = this.im;
    const { rowStart, diagonalPosition, eliminationStart, multiplierPosition, pivotRow } = s;
    const { updateStart, updateSource, updateTarget } = s;
    const invRe = this.inversePivotRe;
    const invIm = this.inversePivotIm;
    const tol2 = STATIC_PIVOT_RELATIVE_TOLERANCE * STATIC_PIVOT_RELATIVE_TOLERANCE;
    for (let i = 0; i < s.size; i++) {
      let rowMax2 = 0;
      const end = rowStart[i + 1];
      for (let k = rowStart[i]; k < end; k++) {
        const r = conductance[k];
        const x = omega * reactance[k];
        re[k] = r;
        im[k] = x;
        const a = r * r + x * x;
        if (a > rowMax2) rowMax2 = a;
      }
      const lastElimination = eliminationStart[i + 1];
      for (let e = eliminationStart[i]; e < lastElimination; e++) {
        const m = multiplierPosition[e];
        const p = pivotRow[e];
        const ar = re[m];
        const ai = im[m];
        if (ar === 0 && ai === 0) continue;
        const lr = ar * invRe[p] - ai * invIm[p];
        const li = ar * invIm[p] + ai * invRe[p];
        re[m] = lr;
        im[m] = li;
        const lastUpdate = updateStart[e + 1];
        for (let u = updateStart[e]; u < lastUpdate; u++) {
          const src = updateSource[u];
          const dst = updateTarget[u];
          const sr = re[src];
          const si = im[src];
          re[dst] -= lr * sr - li * si;
          im[dst] -= lr * si + li * sr;
        }
      }
      const d = diagonalPosition[i];
      const pr = re[d];
      const pi = im[d];
      const mag2 = pr * pr + pi * pi;
      if (!(rowMax2 > 0) || mag2 < tol2 * rowMax2) return false;
      // One division per pivot (the lane-parallel sweep, sparse-lu-complex-lanes.ts, does the same arithmetic).
      const inverseMag2 = 1 / mag2;
      invRe[i] = pr * inverseMag2;
      invIm[i] = -pi * inverseMag2;
    }
    return true;
  }

  /** Solve with the factors; right-hand side and solution in original unknown order. */
  solve(rhsRe: ArrayLike<number>, rhsIm: ArrayLike<number>, solRe: Float64Array, solIm: Float64Array): void {
    const s = this.structure;
    const re = this.re;
    const im = this.im;
    const wr = this.workRe;
    const wi = this.workIm;
    const { rowStart, columnOf, diagonalPosition, originalRowOf, originalColumnOf } = s;
    const n = s.size;
    for (let p = 0; p < n; p++) {
      const r = originalRowOf[p];
      let sr = rhsRe[r];
      let si = rhsIm[r];
      for (let k = rowStart[p]; k < diagonalPosition[p]; k++) {
        const c = columnOf[k];
        sr -= re[k] * wr[c] - im[k] * wi[c];
        si -= re[k] * wi[c] + im[k] * wr[c];
      }
      wr[p] = sr;
      wi[p] = si;
    }
    const invRe = this.inversePivotRe;
    const invIm = this.inversePivotIm;
    for (let p = n - 1; p >= 0; p--) {
      let sr = wr[p];
      let si = wi[p];
      for (let k = diagonalPosition[p] + 1; k < rowStart[p + 1]; k++) {
        const c = columnOf[k];
        sr -= re[k] * wr[c] - im[k] * wi[c];
        si -= re[k] * wi[c] + im[k] * wr[c];
      }
      wr[p] = sr * invRe[p] - si * invIm[p];
      wi[p] = sr * invIm[p] + si * invRe[p];
    }
    for (let q = 0; q < n; q++) {
      solRe[originalColumnOf[q]] = wr[q];
      solIm[originalColumnOf[q]] = wi[q];
    }
  }

  /**
   * Solve the TRANSPOSED system Aᵀ·y = b (not the conjugate transpose) with the same factors, as the adjoint
   * noise method needs: one solve gives the transfer from every source to one output. With P·A·Q = L·U (P the
   * row order originalRowOf, Q the column order originalColumnOf), Aᵀ = Q·Uᵀ·Lᵀ·P, so: gather b by column order,
   * solve Uᵀ (lower, by columns of the row-stored U), then Lᵀ (unit upper, by columns of the row-stored L), and
   * scatter by row order. Right-hand side and solution in original unknown order.
   */
  solveTransposed(rhsRe: ArrayLike<number>, rhsIm: ArrayLike<number>, solRe: Float64Array, solIm: Float64Array): void {
    const s = this.structure;
    const re = this.re;
    const im = this.im;
    const wr = this.workRe;
    const wi = this.workIm;
    const { rowStart, columnOf, diagonalPosition, originalRowOf, originalColumnOf } = s;
    const invRe = this.inversePivotRe;
    const invIm = this.inversePivotIm;
    const n = s.size;
    for (let q = 0; q < n; q++) {
      wr[q] = rhsRe[originalColumnOf[q]];
      wi[q] = rhsIm[originalColumnOf[q]];
    }
    // Uᵀ·z = c: z[p] is final once every earlier row's contribution is subtracted; push it to the later ones.
    for (let p = 0; p < n; p++) {
      const cr = wr[p];
      const ci = wi[p];
      const zr = cr * invRe[p] - ci * invIm[p];
      const zi = cr * invIm[p] + ci * invRe[p];
      wr[p] = zr;
      wi[p] = zi;
      for (let k = diagonalPosition[p] + 1; k < rowStart[p + 1]; k++) {
        const c = columnOf[k];
        wr[c] -= re[k] * zr - im[k] * zi;
        wi[c] -= re[k] * zi + im[k] * zr;
      }
    }
    // Lᵀ·w = z, unit diagonal: from the last row up, push each final w[p] to the earlier rows.
    for (let p = n - 1; p >= 0; p--) {
      const xr = wr[p];
      const xi = wi[p];
      for (let k = rowStart[p]; k < diagonalPosition[p]; k++) {
        const c = columnOf[k];
        wr[c] -= re[k] * xr - im[k] * xi;
        wi[c] -= re[k] * xi + im[k] * xr;
      }
    }
    for (let p = 0; p < n; p++) {
      solRe[originalRowOf[p]] = wr[p];
      solIm[originalRowOf[p]] = wi[p];
    }
  }
}
