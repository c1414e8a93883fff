/**
 * Fill-reducing symmetric ordering by minimum degree, and the fill pattern it produces.
 *
 * Works on the undirected graph of B + Bᵀ (B the row-matched matrix, see matching.ts): repeatedly eliminate the
 * vertex of smallest current degree (ties: lowest index, so the result is reproducible) and join its remaining
 * neighbours into a clique. The neighbours a vertex has when it is eliminated are exactly the off-diagonal
 * non-zeros of its row of U and its column of L, so the same pass yields the symbolic factorisation. Runs once per
 * circuit; Sets are fine here.
 */

export interface SymbolicFactor {
  /** order[p] = matched index eliminated at step p */
  order: Int32Array;
  /** position of each matched index in `order` */
  positionOf: Int32Array;
  /** for each step p, the later steps q > p with a non-zero (p, q) and (q, p) in the factors, ascending */
  upperNeighbours: Int32Array[];
}

/**
 * `early[v]` = 1 puts v in the first elimination class: the positions whose row was matched off its own diagonal
 * (a branch row sitting on one of its nets' columns and that net's row on the branch column, see matching.ts).
 * Their pivots are the ±1 incidence entries; eliminating them before any conductance row can modify them keeps
 * those pivots exact (a chain of small conductances eliminated first could cancel one to zero). Within a class,
 * minimum degree.
 */
export function minimumDegreeOrder(
  size: number,
  edges: ReadonlyArray<readonly [number, number]>,
  early: Uint8Array = new Uint8Array(size),
): SymbolicFactor {
  const adjacency: Set<number>[] = Array.from({ length: size }, () => new Set<number>());
  for (const [a, b] of edges) {
    if (a === b) continue;
    adjacency[a].add(b);
    adjacency[b].add(a);
  }
  const eliminated = new Uint8Array(size);
  const order = new Int32Array(size);
  const positionOf = new Int32Array(size);
  const neighboursAtElimination: number[][] = [];
  for (let step = 0; step < size; step++) {
    let best = -1;
    let bestDegree = Number.POSITIVE_INFINITY;
    for (let v = 0; v < size; v++) {
      if (eliminated[v]) continue;
      // The late class ranks after every early vertex: offset its degree by more than any degree can be.
      const degree = adjacency[v].size + (early[v] ? 0 : size + 1);
      if (degree < bestDegree) {
        bestDegree = degree;
        best = v;
      }
    }
    const neighbours = [...adjacency[best]];
    for (const a of neighbours) {
      adjacency[a].delete(best);
      for (const b of neighbours) if (a !== b) adjacency[a].add(b);
    }
    adjacency[best].clear();
    eliminated[best] = 1;
    order[step] = best;
    positionOf[best] = step;
    neighboursAtElimination.push(neighbours);
  }
  const upperNeighbours = neighboursAtElimination.map((list) => Int32Array.from(list.map((v) => positionOf[v])).sort());
  return { order, positionOf, upperNeighbours };
}
