/**
 * Row-to-column matching that puts a structurally non-zero entry on every diagonal position.
 *
 * Modified nodal analysis has zero diagonals by construction: the row of a voltage-source branch holds only the
 * ±1 entries of its two nets. A sparse LU without run-time pivoting needs a non-zero pivot in every position, so
 * before ordering we permute rows: each column c is given a row r that has an entry in column c (a perfect
 * bipartite matching, found with augmenting paths). Rows keep their own diagonal where it is a strong entry
 * (a node's conductance sum); other rows are matched through strong entries first (a branch row to one of its
 * nets, that net's row to the branch column) and through weak entries only when nothing else is possible.
 */

export interface MatchInput {
  size: number;
  /** entries as parallel arrays */
  rows: ArrayLike<number>;
  cols: ArrayLike<number>;
  weak: ArrayLike<boolean>;
}

/** rowForColumn[c] = the original row placed at diagonal position c; -1 marks a column nothing could cover. */
export function matchRowsToColumns(input: MatchInput): Int32Array {
  const { size } = input;
  const strongRowsOfColumn: number[][] = Array.from({ length: size }, () => []);
  const allRowsOfColumn: number[][] = Array.from({ length: size }, () => []);
  const strongDiagonal = new Uint8Array(size);
  for (let e = 0; e < input.rows.length; e++) {
    const r = input.rows[e];
    const c = input.cols[e];
    allRowsOfColumn[c].push(r);
    if (!input.weak[e]) {
      strongRowsOfColumn[c].push(r);
      if (r === c) strongDiagonal[c] = 1;
    }
  }
  const rowForColumn = new Int32Array(size).fill(-1);
  const columnForRow = new Int32Array(size).fill(-1);
  for (let c = 0; c < size; c++) {
    if (strongDiagonal[c]) {
      rowForColumn[c] = c;
      columnForRow[c] = c;
    }
  }
  const visited = new Int32Array(size).fill(-1);
  const tryAugment = (column: number, adjacency: number[][], stamp: number): boolean => {
    // Iterative depth-first search for an augmenting path from `column`.
    const stackColumn: number[] = [column];
    const stackNext: number[] = [0];
    const viaRow: number[] = [];
    while (stackColumn.length > 0) {
      const depth = stackColumn.length - 1;
      const c = stackColumn[depth];
      const candidates = adjacency[c];
      // Look-ahead: take a free row of this column before re-routing any matched one. Paths stay short, so a
      // branch column pairs with its own net's row and that net's column with the branch row (the ±1 entries)
      // rather than with a small conductance further along a chain.
      if (stackNext[depth] === 0) {
        const free = candidates.find((r) => columnForRow[r] < 0);
        if (free !== undefined) {
          viaRow.push(free);
          for (let d = depth; d >= 0; d--) {
            rowForColumn[stackColumn[d]] = viaRow[d];
            columnForRow[viaRow[d]] = stackColumn[d];
          }
          return true;
        }
      }
      let advanced = false;
      while (stackNext[depth] < candidates.length) {
        const r = candidates[stackNext[depth]++];
        if (visited[r] === stamp) continue;
        visited[r] = stamp;
        const owner = columnForRow[r];
        if (owner < 0) {
          // Free row found: flip the path.
          viaRow.push(r);
          for (let d = depth; d >= 0; d--) {
            const cc = stackColumn[d];
            const rr = viaRow[d];
            rowForColumn[cc] = rr;
            columnForRow[rr] = cc;
          }
          return true;
        }
        viaRow.push(r);
        stackColumn.push(owner);
        stackNext.push(0);
        advanced = true;
        break;
      }
      if (!advanced) {
        stackColumn.pop();
        stackNext.pop();
        viaRow.pop();
      }
    }
    return false;
  };
  let stamp = 0;
  for (const adjacency of [strongRowsOfColumn, allRowsOfColumn]) {
    for (let c = 0; c < size; c++) {
      if (rowForColumn[c] >= 0) continue;
      tryAugment(c, adjacency, stamp++);
    }
  }
  return rowForColumn;
}
