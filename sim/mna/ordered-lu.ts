/**
 * Complex LU of a small matrix in a row order and a sparsity pattern fixed beforehand (static pivots), for many
 * systems that differ only a little from one whose partial-pivoting order is known — the Monte Carlo runs' reduced
 * systems (sim/analyses/spread-sweep.ts), each within a tolerance of the nominal one.
 *
 * No pivot search and no row swaps: step c eliminates with row `order[c]`, and only the entries the pattern (with
 * its fill in that order, worked out once when the plan is made) can hold are touched — the reduced systems of a
 * microphone circuit are about a third full. Each pivot is checked against the largest |entry| of the pivot row
 * from the pivot column on (STATIC_PIVOT_RELATIVE_TOLERANCE, as the sparse static-pivot LU does); a pivot below
 * that is not safe for these numbers and `factor` returns false, so the caller falls back to DenseLuComplex, which
 * pivots. Storage: row-major split re/im arrays of size × size, overwritten by the factors.
 */
import { STATIC_PIVOT_RELATIVE_TOLERANCE } from "./pivot-tolerance";

/** The elimination program of one row order on one pattern. */
export interface OrderedLuPlan {
  size: number;
  order: Int32Array;
  /** per step c: its pivot's index, and the pivot row's entries from column c on (start/end into rowEntries) */
  pivotAt: Int32Array;
  pivotRowStart: Int32Array;
  pivotRowEntries: Int32Array;
  /** per step c: eliminations eliminationStart[c] .. eliminationStart[c+1]−1 */
  eliminationStart: Int32Array;
  /** per elimination: the multiplier's index and its updates updateStart[e] .. updateStart[e+1]−1 */
  multiplierAt: Int32Array;
  updateStart: Int32Array;
  updateSource: Int32Array;
  updateTarget: Int32Array;
  /** per step c, the solve's lower entries (columns < c) and upper entries (columns > c) of row order[c] */
  lowerStart: Int32Array;
  lowerAt: Int32Array;
  lowerColumn: Int32Array;
  upperStart: Int32Array;
  upperAt: Int32Array;
  upperColumn: Int32Array;
}

/** Plan the elimination of `pattern` (size × size row-major, 1 where an entry may be non-zero) in row `order`. */
export function planOrderedLu(size: number, pattern: Uint8Array, order: Int32Array): OrderedLuPlan {
  const n = size;
  const filled = Uint8Array.from(pattern);
  for (let i = 0; i < n; i++) filled[order[i] * n + i] = 1; // pivots are read even when the pattern says zero
  const pivotAt: number[] = [];
  const pivotRowStart = [0];
  const pivotRowEntries: number[] = [];
  const eliminationStart = [0];
  const multiplierAt: number[] = [];
  const updateStart = [0];
  const updateSource: number[] = [];
  const updateTarget: number[] = [];
  for (let c = 0; c < n; c++) {
    const pivotRow = order[c] * n;
    pivotAt.push(pivotRow + c);
    for (let j = c; j < n; j++) if (filled[pivotRow + j]) pivotRowEntries.push(pivotRow + j);
    pivotRowStart.push(pivotRowEntries.length);
    for (let i = c + 1; i < n; i++) {
      const row = order[i] * n;
      if (!filled[row + c]) continue;
      multiplierAt.push(row + c);
      for (let j = c + 1; j < n; j++) {
        if (!filled[pivotRow + j]) continue;
        filled[row + j] = 1;
        updateSource.push(pivotRow + j);
        updateTarget.push(row + j);
      }
      updateStart.push(updateSource.length);
    }
    eliminationStart.push(multiplierAt.length);
  }
  const lowerStart = [0];
  const lowerAt: number[] = [];
  const lowerColumn: number[] = [];
  const upperStart = [0];
  const upperAt: number[] = [];
  const upperColumn: number[] = [];
  for (let c = 0; c < n; c++) {
    const row = order[c] * n;
    for (let j = 0; j < n; j++) {
      if (!filled[row + j] || j === c) continue;
      (j < c ? lowerAt : upperAt).push(row + j);
      (j < c ? lowerColumn : upperColumn).push(j);
    }
    lowerStart.push(lowerAt.length);
    upperStart.push(upperAt.length);
  }
  return {
    size,
    order: Int32Array.from(order),
    pivotAt: Int32Array.from(pivotAt),
    pivotRowStart: Int32Array.from(pivotRowStart),
    pivotRowEntries: Int32Array.from(pivotRowEntries),
    eliminationStart: Int32Array.from(eliminationStart),
    multiplierAt: Int32Array.from(multiplierAt),
    updateStart: Int32Array.from(updateStart),
    updateSource: Int32Array.from(updateSource),
    updateTarget: Int32Array.from(updateTarget),
    lowerStart: Int32Array.from(lowerStart),
    lowerAt: Int32Array.from(lowerAt),
    lowerColumn: Int32Array.from(lowerColumn),
    upperStart: Int32Array.from(upperStart),
    upperAt: Int32Array.from(upperAt),
    upperColumn: Int32Array.from(upperColumn),
  };
}

export class OrderedLu {
  readonly size: number;
  readonly re: Float64Array;
  readonly im: Float64Array;
  private plan: OrderedLuPlan | null = null;
  private readonly inverseRe: Float64Array;
  private readonly inverseIm: Float64Array;
  private readonly workRe: Float64Array;
  private readonly workIm: Float64Array;

  constructor(size: number) {
    this.size = size;
    this.re = new Float64Array(size * size);
    this.im = new Float64Array(size * size);
    this.inverseRe = new Float64Array(size);
    this.inverseIm = new Float64Array(size);
    this.workRe = new Float64Array(size);
    this.workIm = new Float64Array(size);
  }

  /**
   * Factor the loaded matrix by `plan` (entries outside the plan's pattern must be zero). False when a pivot is too
   * small for its row; the factors are then meaningless.
   */
  factor(plan: OrderedLuPlan): boolean {
    const n = this.size;
    const { re, im, inverseRe, inverseIm } = this;
    const { pivotAt, pivotRowStart, pivotRowEntries, eliminationStart, multiplierAt } = plan;
    const { updateStart, updateSource, updateTarget } = plan;
    this.plan = plan;
    const tol2 = STATIC_PIVOT_RELATIVE_TOLERANCE * STATIC_PIVOT_RELATIVE_TOLERANCE;
    for (let c = 0; c < n; c++) {
      let rowMax2 = 0;
      for (let q = pivotRowStart[c]; q < pivotRowStart[c + 1]; q++) {
        const at = pivotRowEntries[q];
        const a2 = re[at] * re[at] + im[at] * im[at];
        if (a2 > rowMax2) rowMax2 = a2;
      }
      const pr = re[pivotAt[c]];
      const pi = im[pivotAt[c]];
      const mag2 = pr * pr + pi * pi;
      if (!(mag2 > 0) || mag2 < tol2 * rowMax2) return false;
      const invRe = pr / mag2;
      const invIm = -pi / mag2;
      inverseRe[c] = invRe;
      inverseIm[c] = invIm;
      for (let e = eliminationStart[c]; e < eliminationStart[c + 1]; e++) {
        const m = multiplierAt[e];
        const ar = re[m];
        const ai = im[m];
        const lr = ar * invRe - ai * invIm;
        const li = ar * invIm + ai * invRe;
        re[m] = lr;
        im[m] = li;
        for (let u = updateStart[e]; u < updateStart[e + 1]; u++) {
          const src = updateSource[u];
          const dst = updateTarget[u];
          const sr = re[src];
          const si = im[src];
          re[dst] -= lr * sr - li * si;
          im[dst] -= lr * si + li * sr;
        }
      }
    }
    return true;
  }

  /** Solve A·x = b with the factors of the last successful `factor`. */
  solve(rhsRe: ArrayLike<number>, rhsIm: ArrayLike<number>, solRe: Float64Array, solIm: Float64Array): void {
    const n = this.size;
    const { re, im, inverseRe, inverseIm, workRe, workIm } = this;
    const { order, lowerStart, lowerAt, lowerColumn, upperStart, upperAt, upperColumn } = this.plan!;
    for (let c = 0; c < n; c++) {
      let sr = rhsRe[order[c]];
      let si = rhsIm[order[c]];
      for (let q = lowerStart[c]; q < lowerStart[c + 1]; q++) {
        const at = lowerAt[q];
        const j = lowerColumn[q];
        sr -= re[at] * workRe[j] - im[at] * workIm[j];
        si -= re[at] * workIm[j] + im[at] * workRe[j];
      }
      workRe[c] = sr;
      workIm[c] = si;
    }
    for (let c = n - 1; c >= 0; c--) {
      let sr = workRe[c];
      let si = workIm[c];
      for (let q = upperStart[c]; q < upperStart[c + 1]; q++) {
        const at = upperAt[q];
        const j = upperColumn[q];
        sr -= re[at] * solRe[j] - im[at] * solIm[j];
        si -= re[at] * solIm[j] + im[at] * solRe[j];
      }
      solRe[c] = sr * inverseRe[c] - si * inverseIm[c];
      solIm[c] = sr * inverseIm[c] + si * inverseRe[c];
    }
  }
}
