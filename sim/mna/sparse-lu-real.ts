/**
 * Numeric sparse LU of a real system (the DC Newton Jacobian) on a compiled structure (sparse-structure.ts).
 * Typed arrays only; no allocation after construction.
 */
import { STATIC_PIVOT_RELATIVE_TOLERANCE } from "./pivot-tolerance";
import type { SparseStructure } from "./sparse-structure";

export class SparseLuReal {
  readonly structure: SparseStructure;
  /** matrix values by storage position; index nnz is the ground scratch slot */
  readonly values: Float64Array;
  private readonly inversePivot: Float64Array;
  private readonly work: Float64Array;

  constructor(structure: SparseStructure) {
    this.structure = structure;
    this.values = new Float64Array(structure.nnz + 1);
    this.inversePivot = new Float64Array(structure.size);
    this.work = new Float64Array(structure.size);
  }

  clear(): void {
    this.values.fill(0);
  }

  /** Factor in place. False when a static pivot is too small for its row (use the dense fallback). */
  factor(): boolean {
    const s = this.structure;
    const v = this.values;
    const { rowStart, diagonalPosition, eliminationStart, multiplierPosition, pivotRow } = s;
    const { updateStart, updateSource, updateTarget } = s;
    const inv = this.inversePivot;
    const tol2 = STATIC_PIVOT_RELATIVE_TOLERANCE * STATIC_PIVOT_RELATIVE_TOLERANCE;
    for (let i = 0; i < s.size; i++) {
      let rowMax2 = 0;
      for (let k = rowStart[i]; k < rowStart[i + 1]; k++) {
        const a = v[k] * v[k];
        if (a > rowMax2) rowMax2 = a;
      }
      for (let e = eliminationStart[i]; e < eliminationStart[i + 1]; e++) {
        const m = multiplierPosition[e];
        const l = v[m] * inv[pivotRow[e]];
        v[m] = l;
        if (l === 0) continue;
        for (let u = updateStart[e]; u < updateStart[e + 1]; u++) v[updateTarget[u]] -= l * v[updateSource[u]];
      }
      const pivot = v[diagonalPosition[i]];
      if (!(rowMax2 > 0) || pivot * pivot < tol2 * rowMax2) return false;
      inv[i] = 1 / pivot;
    }
    return true;
  }

  /** Solve with the factors; `rhs` and `solution` are in original unknown order (may be the same array). */
  solve(rhs: ArrayLike<number>, solution: Float64Array): void {
    const s = this.structure;
    const v = this.values;
    const w = this.work;
    const { rowStart, columnOf, diagonalPosition, originalRowOf, originalColumnOf } = s;
    const n = s.size;
    for (let p = 0; p < n; p++) {
      let sum = rhs[originalRowOf[p]];
      for (let k = rowStart[p]; k < diagonalPosition[p]; k++) sum -= v[k] * w[columnOf[k]];
      w[p] = sum;
    }
    for (let p = n - 1; p >= 0; p--) {
      let sum = w[p];
      for (let k = diagonalPosition[p] + 1; k < rowStart[p + 1]; k++) sum -= v[k] * w[columnOf[k]];
      w[p] = sum * this.inversePivot[p];
    }
    for (let q = 0; q < n; q++) solution[originalColumnOf[q]] = w[q];
  }
}
