/**
 * The compiled sparse structure of one system (the DC Jacobian or the AC matrix of a circuit), built once.
 *
 * Pivoting choice (documented as the brief asks): STATIC pivoting. Rows are matched to columns so that every
 * pivot is a structural non-zero (matching.ts: branch rows of voltage sources take one of their nets' columns),
 * then a symmetric minimum-degree order reduces fill (ordering.ts), eliminating the off-diagonal-matched pairs
 * first so their ±1 pivots are never modified by conductance rows. The pivot sequence never changes at run time,
 * so the fill pattern and every index array of the elimination are computed here, once. At run time the numeric
 * factorisation (sparse-lu.ts) checks each pivot against the size of its row; a pivot that is tiny relative to
 * its row means static pivoting is not safe for these numbers, and the caller re-solves that system with the dense
 * partial-pivoting LU (dense-lu.ts). Microphone circuits are almost all passive, diagonally dominant node rows
 * plus ±1 branch rows, so the fallback is rare.
 *
 * Storage: the factors L (unit lower, multipliers) and U share one array of positions laid out row by row in the
 * permuted order, columns ascending, diagonal included. Position `nnz` is a scratch slot for ground entries.
 */
import { minimumDegreeOrder } from "./ordering";
import { matchRowsToColumns } from "./matching";
import { DISCARDED_HANDLE, type PatternBuilder } from "./pattern";
import { SingularMatrixError } from "./singular";

export type SystemKind = "dc" | "ac";

export interface SparseStructure {
  size: number;
  /** number of stored positions (original entries plus fill); the scratch slot is at index nnz */
  nnz: number;
  /** handle → storage position (DISCARDED_HANDLE and entries absent from this system → nnz) */
  positionOfHandle: Int32Array;
  /** CSR of the permuted factor pattern */
  rowStart: Int32Array;
  columnOf: Int32Array;
  diagonalPosition: Int32Array;
  /** permuted row p holds original row originalRowOf[p]; permuted column q is original unknown originalColumnOf[q] */
  originalRowOf: Int32Array;
  originalColumnOf: Int32Array;
  /**
   * Elimination program, row by row: for row i, eliminations eliminationStart[i] .. eliminationStart[i+1]−1; each
   * elimination e divides position multiplierPosition[e] by the pivot of row pivotRow[e] and subtracts that
   * multiple of the pivot row's upper part, updates updateStart[e] .. updateStart[e+1]−1 (target −= l · source).
   */
  eliminationStart: Int32Array;
  multiplierPosition: Int32Array;
  pivotRow: Int32Array;
  updateStart: Int32Array;
  updateSource: Int32Array;
  updateTarget: Int32Array;
}

export function compileSparseStructure(pattern: PatternBuilder, kind: SystemKind): SparseStructure {
  const size = pattern.size;
  const included: number[] = [];
  for (let h = 1; h < pattern.entries.length; h++) {
    if (kind === "dc" && pattern.entries[h].acOnly) continue;
    included.push(h);
  }
  const rows = included.map((h) => pattern.entries[h].row);
  const cols = included.map((h) => pattern.entries[h].col);
  const weak = included.map((h) => pattern.entries[h].weak);
  const rowForColumn = matchRowsToColumns({ size, rows, cols, weak });
  const columnForRow = new Int32Array(size).fill(-1);
  for (let c = 0; c < size; c++) {
    if (rowForColumn[c] < 0) {
      throw new SingularMatrixError(c, `unknown ${c} appears in no equation that could determine it`);
    }
    columnForRow[rowForColumn[c]] = c;
  }
  const edges: Array<[number, number]> = rows.map((r, e) => [columnForRow[r], cols[e]]);
  const offDiagonal = new Uint8Array(size);
  for (let c = 0; c < size; c++) offDiagonal[c] = rowForColumn[c] !== c ? 1 : 0;
  const symbolic = minimumDegreeOrder(size, edges, offDiagonal);
  const { order, positionOf, upperNeighbours } = symbolic;

  // Lower part of permuted row p: every earlier step q whose upper neighbours contain p.
  const lowerOf: number[][] = Array.from({ length: size }, () => []);
  for (let q = 0; q < size; q++) for (const p of upperNeighbours[q]) lowerOf[p].push(q);
  const rowStart = new Int32Array(size + 1);
  const columnList: number[] = [];
  const diagonalPosition = new Int32Array(size);
  for (let p = 0; p < size; p++) {
    rowStart[p] = columnList.length;
    for (const q of lowerOf[p]) columnList.push(q); // ascending by construction
    diagonalPosition[p] = columnList.length;
    columnList.push(p);
    for (const q of upperNeighbours[p]) columnList.push(q);
  }
  rowStart[size] = columnList.length;
  const nnz = columnList.length;
  const columnOf = Int32Array.from(columnList);

  const positionInRow = new Int32Array(size).fill(-1);
  const findPosition = (p: number, q: number): number => {
    for (let k = rowStart[p]; k < rowStart[p + 1]; k++) if (columnOf[k] === q) return k;
    throw new Error(`internal: position (${p}, ${q}) missing from the fill pattern`);
  };

  const originalRowOf = new Int32Array(size);
  const originalColumnOf = new Int32Array(size);
  for (let p = 0; p < size; p++) {
    originalColumnOf[p] = order[p];
    originalRowOf[p] = rowForColumn[order[p]];
  }
  const positionOfHandle = new Int32Array(pattern.entries.length).fill(nnz);
  for (const h of included) {
    const { row, col } = pattern.entries[h];
    positionOfHandle[h] = findPosition(positionOf[columnForRow[row]], positionOf[col]);
  }
  positionOfHandle[DISCARDED_HANDLE] = nnz;

  const eliminationStart = new Int32Array(size + 1);
  const multiplierPosition: number[] = [];
  const pivotRow: number[] = [];
  const updateStart: number[] = [];
  const updateSource: number[] = [];
  const updateTarget: number[] = [];
  for (let i = 0; i < size; i++) {
    eliminationStart[i] = multiplierPosition.length;
    for (let k = rowStart[i]; k < rowStart[i + 1]; k++) positionInRow[columnOf[k]] = k;
    for (let k = rowStart[i]; k < diagonalPosition[i]; k++) {
      const pivot = columnOf[k];
      multiplierPosition.push(k);
      pivotRow.push(pivot);
      updateStart.push(updateSource.length);
      for (let s = diagonalPosition[pivot] + 1; s < rowStart[pivot + 1]; s++) {
        const target = positionInRow[columnOf[s]];
        if (target < 0) throw new Error(`internal: fill (${i}, ${columnOf[s]}) missing`);
        updateSource.push(s);
        updateTarget.push(target);
      }
    }
    for (let k = rowStart[i]; k < rowStart[i + 1]; k++) positionInRow[columnOf[k]] = -1;
  }
  eliminationStart[size] = multiplierPosition.length;
  updateStart.push(updateSource.length);

  return {
    size,
    nnz,
    positionOfHandle,
    rowStart,
    columnOf,
    diagonalPosition,
    originalRowOf,
    originalColumnOf,
    eliminationStart,
    multiplierPosition: Int32Array.from(multiplierPosition),
    pivotRow: Int32Array.from(pivotRow),
    updateStart: Int32Array.from(updateStart),
    updateSource: Int32Array.from(updateSource),
    updateTarget: Int32Array.from(updateTarget),
  };
}
