/**
 * Linearised terminal currents of a three-terminal nonlinear device. The device computes, at its (limited)
 * linearisation voltages V0, the current I0[r] flowing INTO each terminal r from its net and the Jacobian
 * G[r][j] = ∂I[r]/∂V(terminal j). The Newton companion is then I[r] ≈ I0[r] + Σ_j G[r][j]·(V_j − V0_j):
 * matrix (r, j) += G[r][j], right-hand side r −= I0[r] − Σ_j G[r][j]·V0_j. The small-signal stamp is G alone.
 */
import type { PatternBuilder } from "../mna/pattern";
import type { AcStampContext, DcStampContext } from "./device";

export const TERMINALS = 3;

export class TerminalBlock {
  private readonly nets: readonly number[];
  private readonly handles = new Int32Array(TERMINALS * TERMINALS);
  /** current into each terminal at the linearisation point, A */
  readonly current = new Float64Array(TERMINALS);
  /** Jacobian, row-major: jacobian[r*3 + j] = ∂I[r]/∂V[j], S */
  readonly jacobian = new Float64Array(TERMINALS * TERMINALS);
  /** terminal voltages (to ground) at the linearisation point, V */
  readonly voltage = new Float64Array(TERMINALS);

  constructor(nets: readonly number[]) {
    this.nets = nets;
  }

  declare(p: PatternBuilder): void {
    for (let r = 0; r < TERMINALS; r++) {
      for (let j = 0; j < TERMINALS; j++) {
        // A nonlinear conductance vanishes in cut-off: weak, pivot selection does not rely on it.
        this.handles[r * TERMINALS + j] = p.entry(this.nets[r], this.nets[j], { weak: true });
      }
    }
  }

  clear(): void {
    this.current.fill(0);
    this.jacobian.fill(0);
  }

  stampDc(ctx: DcStampContext): void {
    for (let r = 0; r < TERMINALS; r++) {
      let offset = this.current[r];
      for (let j = 0; j < TERMINALS; j++) {
        const g = this.jacobian[r * TERMINALS + j];
        ctx.add(this.handles[r * TERMINALS + j], g);
        offset -= g * this.voltage[j];
      }
      ctx.addRhs(this.nets[r], -offset);
    }
  }

  stampAc(ctx: AcStampContext): void {
    for (let k = 0; k < TERMINALS * TERMINALS; k++) ctx.addConductance(this.handles[k], this.jacobian[k]);
  }
}
