/**
 * Raised by the linear algebra when a system cannot be solved. It knows only unknown indices; the analyses turn
 * the index into a net or part name (sim/analyses/compile.ts) and raise a `SimError("singular_circuit", …)`.
 */
export class SingularMatrixError extends Error {
  /** the unknown (column) that nothing determines */
  readonly unknown: number;

  constructor(unknown: number, message: string) {
    super(message);
    this.name = "SingularMatrixError";
    this.unknown = unknown;
  }
}
