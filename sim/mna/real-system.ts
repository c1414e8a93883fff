/**
 * A real linear system on a compiled sparse structure: stamp into `values` and `rhs`, then `solve`. Sparse LU with
 * static pivots first; when a pivot is too small, the same numbers are solved by dense partial pivoting.
 */
import { DenseLuComplex } from "./dense-lu";
import { SingularMatrixError } from "./singular";
import { SparseLuReal } from "./sparse-lu-real";
import type { SparseStructure } from "./sparse-structure";

export class RealSystem {
  readonly structure: SparseStructure;
  /** matrix values by storage position (write through `positionOfHandle`) */
  readonly values: Float64Array;
  /** right-hand side by unknown; index `size` is the ground scratch slot */
  readonly rhs: Float64Array;
  private readonly lu: SparseLuReal;
  private dense: DenseLuComplex | null = null;
  private denseIm: Float64Array | null = null;
  /** how many solves needed the dense fallback (diagnostics and tests) */
  denseFallbacks = 0;

  constructor(structure: SparseStructure) {
    this.structure = structure;
    this.lu = new SparseLuReal(structure);
    this.values = new Float64Array(structure.nnz + 1);
    this.rhs = new Float64Array(structure.size + 1);
  }

  clear(): void {
    this.values.fill(0);
    this.rhs.fill(0);
  }

  /** Solve the stamped system into `solution` (length ≥ size). Throws SingularMatrixError. */
  solve(solution: Float64Array): void {
    const n = this.structure.size;
    this.lu.values.set(this.values);
    if (this.lu.factor()) {
      this.lu.solve(this.rhs, solution);
      if (allFinite(solution, n)) return;
    }
    this.denseFallbacks++;
    if (!this.dense) {
      this.dense = new DenseLuComplex(n);
      this.denseIm = new Float64Array(n);
    }
    this.dense.loadFromSparse(this.structure, this.values);
    this.dense.factor();
    this.dense.solve(this.rhs, null, solution, this.denseIm!);
    if (!allFinite(solution, n)) throw new SingularMatrixError(0, "solution is not finite");
  }

  /** residual[i] = (A·x − b)[i] and a per-row scale (largest |term|) for relative tests */
  residual(x: ArrayLike<number>, residual: Float64Array, rowScale: Float64Array): void {
    const s = this.structure;
    const { rowStart, columnOf, originalRowOf, originalColumnOf } = s;
    const v = this.values;
    for (let p = 0; p < s.size; p++) {
      const row = originalRowOf[p];
      const b = this.rhs[row];
      let sum = -b;
      let scale = Math.abs(b);
      for (let k = rowStart[p]; k < rowStart[p + 1]; k++) {
        const term = v[k] * x[originalColumnOf[columnOf[k]]];
        sum += term;
        const a = Math.abs(term);
        if (a > scale) scale = a;
      }
      residual[row] = sum;
      rowScale[row] = scale;
    }
  }
}

export function allFinite(values: ArrayLike<number>, count: number): boolean {
  for (let i = 0; i < count; i++) if (!Number.isFinite(values[i])) return false;
  return true;
}
