/**
 * The plan of a complex LU of a small matrix in a row order and a sparsity pattern fixed beforehand (static
 * pivots), for many systems that differ only a little from one whose partial-pivoting order is known — the Monte
 * Carlo runs' reduced systems (sim/analyses/spread-sweep.ts), each within a tolerance of the nominal one. The
 * factorisation itself runs four systems at a time (ordered-lu-lanes.ts).
 *
 * No pivot search and no row swaps: step c eliminates with row `order[c]`, and only the entries the pattern (with
 * its fill in that order, worked out here once) can hold are touched — the reduced systems of a microphone circuit
 * are about a third full. Indices are into a row-major size × size matrix.
 */

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
