/**
 * The small-signal system A(ω) = G + jω·C on a compiled sparse structure. G ("conductance") and C ("reactance
 * coefficients": capacitances, and −L on inductor branch rows) are stamped once at the operating point; each
 * frequency then costs one load, one numeric factorisation and one triangular solve per right-hand side.
 * A frequency whose static pivots are unsafe is factored densely instead (same numbers).
 */
import { DenseLuComplex } from "./dense-lu";
import { SingularMatrixError } from "./singular";
import { SparseLuComplex } from "./sparse-lu-complex";
import type { SparseStructure } from "./sparse-structure";
import { allFinite } from "./real-system";

export class ComplexSystem {
  readonly structure: SparseStructure;
  readonly conductance: Float64Array;
  readonly reactance: Float64Array;
  private readonly lu: SparseLuComplex;
  private dense: DenseLuComplex | null = null;
  private useDense = false;
  denseFallbacks = 0;

  constructor(structure: SparseStructure) {
    this.structure = structure;
    this.conductance = new Float64Array(structure.nnz + 1);
    this.reactance = new Float64Array(structure.nnz + 1);
    this.lu = new SparseLuComplex(structure);
  }

  clear(): void {
    this.conductance.fill(0);
    this.reactance.fill(0);
  }

  /** Factor A(ω) for angular frequency omega (rad/s). Throws SingularMatrixError when no pivot order works. */
  factorAt(omega: number): void {
    if (this.lu.factorAt(this.conductance, this.reactance, omega)) {
      this.useDense = false;
      return;
    }
    this.denseFallbacks++;
    this.useDense = true;
    if (!this.dense) this.dense = new DenseLuComplex(this.structure.size);
    this.lu.loadAtFrequency(this.conductance, this.reactance, omega);
    this.dense.loadFromSparse(this.structure, this.lu.re, this.lu.im);
    this.dense.factor();
  }

  /** Solve with the current factors. rhs arrays may be longer than size (ground scratch slot). */
  solve(rhsRe: ArrayLike<number>, rhsIm: ArrayLike<number>, solRe: Float64Array, solIm: Float64Array): void {
    // The sparse path needs no finiteness check: every accepted pivot is non-zero and not small for its row.
    if (!this.useDense) {
      this.lu.solve(rhsRe, rhsIm, solRe, solIm);
      return;
    }
    this.dense!.solve(rhsRe, rhsIm, solRe, solIm);
    const n = this.structure.size;
    if (!allFinite(solRe, n) || !allFinite(solIm, n)) throw new SingularMatrixError(0, "solution is not finite");
  }

  /**
   * Solve the transposed system A(ω)ᵀ·y = b (not conjugated) with the current factors — the adjoint solve of the
   * noise analysis, without a second structure. Same conventions as `solve`.
   */
  solveTransposed(rhsRe: ArrayLike<number>, rhsIm: ArrayLike<number>, solRe: Float64Array, solIm: Float64Array): void {
    if (!this.useDense) {
      this.lu.solveTransposed(rhsRe, rhsIm, solRe, solIm);
      return;
    }
    this.dense!.solveTransposed(rhsRe, rhsIm, solRe, solIm);
    const n = this.structure.size;
    if (!allFinite(solRe, n) || !allFinite(solIm, n)) throw new SingularMatrixError(0, "solution is not finite");
  }
}
