/**
 * Dense complex LU with partial (row) pivoting on typed arrays, split real/imaginary, row-major.
 *
 * Two jobs: the fallback when a static sparse pivot is too small (sparse-structure.ts), and the second baseline
 * of the benchmark. A real system is solved as a complex one with zero imaginary parts.
 */
import { DENSE_SINGULAR_RELATIVE_TOLERANCE } from "./pivot-tolerance";
import { SingularMatrixError } from "./singular";
import type { SparseStructure } from "./sparse-structure";

export class DenseLuComplex {
  readonly size: number;
  readonly re: Float64Array;
  readonly im: Float64Array;
  private readonly rowOfStep: Int32Array;
  private readonly transposedWorkRe: Float64Array;
  private readonly transposedWorkIm: Float64Array;

  constructor(size: number) {
    this.size = size;
    this.re = new Float64Array(size * size);
    this.im = new Float64Array(size * size);
    this.rowOfStep = new Int32Array(size);
    this.transposedWorkRe = new Float64Array(size);
    this.transposedWorkIm = new Float64Array(size);
  }

  /** After `factor`: the original row eliminated at each step (the order OrderedDenseLu can repeat). */
  rowOrder(): Int32Array {
    return Int32Array.from(this.rowOfStep);
  }

  clear(): void {
    this.re.fill(0);
    this.im.fill(0);
  }

  /** Fill from values stored in a compiled sparse structure's positions (before factorisation). */
  loadFromSparse(structure: SparseStructure, valuesRe: ArrayLike<number>, valuesIm?: ArrayLike<number>): void {
    this.clear();
    const n = this.size;
    const { rowStart, columnOf, originalRowOf, originalColumnOf } = structure;
    for (let p = 0; p < n; p++) {
      const row = originalRowOf[p] * n;
      for (let k = rowStart[p]; k < rowStart[p + 1]; k++) {
        const at = row + originalColumnOf[columnOf[k]];
        this.re[at] += valuesRe[k];
        if (valuesIm) this.im[at] += valuesIm[k];
      }
    }
  }

  /** Factor in place; throws SingularMatrixError naming the first column with no usable pivot. */
  factor(): void {
    const n = this.size;
    const re = this.re;
    const im = this.im;
    let scale2 = 0;
    for (let k = 0; k < n * n; k++) scale2 = Math.max(scale2, re[k] * re[k] + im[k] * im[k]);
    const zero2 = scale2 * DENSE_SINGULAR_RELATIVE_TOLERANCE * DENSE_SINGULAR_RELATIVE_TOLERANCE;
    const perm = this.rowOfStep;
    for (let i = 0; i < n; i++) perm[i] = i;
    for (let c = 0; c < n; c++) {
      let best = -1;
      let bestMag2 = zero2;
      for (let r = c; r < n; r++) {
        const at = r * n + c;
        const m2 = re[at] * re[at] + im[at] * im[at];
        if (m2 > bestMag2) {
          bestMag2 = m2;
          best = r;
        }
      }
      if (best < 0 || !(bestMag2 > 0)) {
        throw new SingularMatrixError(c, `no usable pivot in column ${c}`);
      }
      if (best !== c) {
        for (let j = 0; j < n; j++) {
          const a = c * n + j;
          const b = best * n + j;
          const tr = re[a];
          re[a] = re[b];
          re[b] = tr;
          const ti = im[a];
          im[a] = im[b];
          im[b] = ti;
        }
        const tp = perm[c];
        perm[c] = perm[best];
        perm[best] = tp;
      }
      const d = c * n + c;
      const invRe = re[d] / bestMag2;
      const invIm = -im[d] / bestMag2;
      for (let r = c + 1; r < n; r++) {
        const at = r * n + c;
        const ar = re[at];
        const ai = im[at];
        if (ar === 0 && ai === 0) continue;
        const lr = ar * invRe - ai * invIm;
        const li = ar * invIm + ai * invRe;
        re[at] = lr;
        im[at] = li;
        for (let j = c + 1; j < n; j++) {
          const src = c * n + j;
          const dst = r * n + j;
          re[dst] -= lr * re[src] - li * im[src];
          im[dst] -= lr * im[src] + li * re[src];
        }
      }
    }
  }

  solve(rhsRe: ArrayLike<number>, rhsIm: ArrayLike<number> | null, solRe: Float64Array, solIm: Float64Array): void {
    const n = this.size;
    const re = this.re;
    const im = this.im;
    const perm = this.rowOfStep;
    for (let i = 0; i < n; i++) {
      let sr = rhsRe[perm[i]];
      let si = rhsIm ? rhsIm[perm[i]] : 0;
      for (let k = 0; k < i; k++) {
        const at = i * n + k;
        sr -= re[at] * solRe[k] - im[at] * solIm[k];
        si -= re[at] * solIm[k] + im[at] * solRe[k];
      }
      solRe[i] = sr;
      solIm[i] = si;
    }
    for (let i = n - 1; i >= 0; i--) {
      let sr = solRe[i];
      let si = solIm[i];
      for (let k = i + 1; k < n; k++) {
        const at = i * n + k;
        sr -= re[at] * solRe[k] - im[at] * solIm[k];
        si -= re[at] * solIm[k] + im[at] * solRe[k];
      }
      const d = i * n + i;
      const m2 = re[d] * re[d] + im[d] * im[d];
      solRe[i] = (sr * re[d] + si * im[d]) / m2;
      solIm[i] = (si * re[d] - sr * im[d]) / m2;
    }
  }

  /**
   * Solve the transposed system Aᵀ·y = b (not conjugated) with the factors: P·A = L·U gives Aᵀ = Uᵀ·Lᵀ·P, so
   * solve Uᵀ (lower) forwards, Lᵀ (unit upper) backwards, then undo the row permutation.
   */
  solveTransposed(
    rhsRe: ArrayLike<number>,
    rhsIm: ArrayLike<number> | null,
    solRe: Float64Array,
    solIm: Float64Array,
  ): void {
    const n = this.size;
    const re = this.re;
    const im = this.im;
    const perm = this.rowOfStep;
    const zr = this.transposedWorkRe;
    const zi = this.transposedWorkIm;
    for (let i = 0; i < n; i++) {
      let sr = rhsRe[i];
      let si = rhsIm ? rhsIm[i] : 0;
      for (let k = 0; k < i; k++) {
        const at = k * n + i;
        sr -= re[at] * zr[k] - im[at] * zi[k];
        si -= re[at] * zi[k] + im[at] * zr[k];
      }
      const d = i * n + i;
      const m2 = re[d] * re[d] + im[d] * im[d];
      zr[i] = (sr * re[d] + si * im[d]) / m2;
      zi[i] = (si * re[d] - sr * im[d]) / m2;
    }
    for (let i = n - 1; i >= 0; i--) {
      let sr = zr[i];
      let si = zi[i];
      for (let k = i + 1; k < n; k++) {
        const at = k * n + i;
        sr -= re[at] * zr[k] - im[at] * zi[k];
        si -= re[at] * zi[k] + im[at] * zr[k];
      }
      zr[i] = sr;
      zi[i] = si;
    }
    for (let i = 0; i < n; i++) {
      solRe[perm[i]] = zr[i];
      solIm[perm[i]] = zi[i];
    }
  }
}
