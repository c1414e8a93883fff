/**
 * The transient stamping context (implements TransientStampContext): the DC Newton context on the full (AC)
 * sparse structure — every capacitance position is present — plus the stored quantities of every device and the
 * integration formula of the present step (integration.ts).
 *
 * Stored quantities live in one array per time level: `q` (at the point being solved; written by every stamp),
 * `q1` (last accepted point), `q2` (the one before) and `dq1`, `dq2` (their time derivatives). Device d's local
 * index k is `base[d] + k`. While `initialising`, stamps only record q at the present x (the start of a run).
 */
import type { ElaboratedPart } from "../circuit/types";
import type { TransientStampContext } from "../devices/device";
import { type TwoTerminalHandles, stampTwoTerminal, voltageAt } from "../devices/stamps";
import type { RealSystem } from "../mna/real-system";
import type { Drive } from "./drive";
import { type IntegrationCoefficients, integrationCoefficients } from "./integration";
import { NewtonContext } from "./newton-context";

export class TransientContext extends NewtonContext implements TransientStampContext {
  time = 0;
  readonly operatingPoint: Float64Array;
  readonly drive: Drive | null;
  /** off: sources at their dc (a power-on run before t = 0⁺ has every state at 0 instead) */
  initialising = false;
  /** the start of a run from the periodic small-signal solution: resonance-filter states from the phasor */
  periodicStart = false;
  /** offset of the present device's stored quantities */
  base = 0;
  coefficients: IntegrationCoefficients = integrationCoefficients("backward-euler", 1, 1);
  readonly q: Float64Array;
  readonly q1: Float64Array;
  readonly q2: Float64Array;
  readonly dq1: Float64Array;
  readonly dq2: Float64Array;

  constructor(
    system: RealSystem,
    x: Float64Array,
    thermalVoltage: number,
    operatingPoint: Float64Array,
    states: number,
    drive: Drive | null,
  ) {
    super(system, x, thermalVoltage);
    this.operatingPoint = operatingPoint;
    this.drive = drive;
    this.q = new Float64Array(states);
    this.q1 = new Float64Array(states);
    this.q2 = new Float64Array(states);
    this.dq1 = new Float64Array(states);
    this.dq2 = new Float64Array(states);
  }

  /** c1·q_n + c2·q_{n−1} + cd·(dq/dt)_n of stored quantity k (global index) */
  history(k: number): number {
    const c = this.coefficients;
    return c.c1 * this.q1[k] + c.c2 * this.q2[k] + c.cd * this.dq1[k];
  }

  sourceValue(part: ElaboratedPart): number {
    const dc = part.values.dc as number;
    return this.drive ? dc + this.drive.sourceDrive(part, this.time) : dc;
  }

  capacitance(state: number, h: TwoTerminalHandles, a: number, b: number, c: number, offset = 0): void {
    const k = this.base + state;
    const x = this.x;
    this.q[k] = c * (voltageAt(x, a) - voltageAt(x, b) - offset);
    if (this.initialising || c === 0) return;
    const a0 = this.coefficients.a0;
    stampTwoTerminal(this.add, h, a0 * c);
    // i(a → b) = a0·C·(V(a) − V(b)) − a0·C·offset + history: the constant part moves to the right-hand side.
    const constant = this.history(k) - a0 * c * offset;
    this.addRhs(a, -constant);
    this.addRhs(b, constant);
  }

  inductance(state: number, self: number, branch: number, l: number): void {
    const k = this.base + state;
    this.q[k] = l * this.x[branch];
    if (this.initialising) return;
    this.add(self, -this.coefficients.a0 * l);
    this.addRhs(branch, this.history(k));
  }

  capsulePressure(state: number, resonance: number | undefined, quality: number): number {
    const drive = this.drive;
    const p = drive ? drive.pressure(this.time) : 0;
    if (resonance === undefined) return p;
    const k = this.base + state;
    const w0 = 2 * Math.PI * resonance;
    if (this.initialising) {
      // y = filtered pressure, w = dy/dt; at rest, or on the periodic solution Im(P·H(jω)·e^{jωt}) at t = 0.
      let y = 0;
      let w = 0;
      if (this.periodicStart && drive?.acoustic) {
        const r = drive!.omega / w0;
        const dr = 1 - r * r;
        const di = r / quality;
        const m2 = dr * dr + di * di;
        y = (drive!.pressureAmplitude * -di) / m2;
        w = (drive!.pressureAmplitude * drive!.omega * dr) / m2;
      }
      this.q[k] = y;
      this.q[k + 1] = w;
      return y;
    }
    // y' = w, w' = ω0²(p − y) − (ω0/q)·w, each derivative by the step's formula, solved exactly for y.
    const a0 = this.coefficients.a0;
    const hy = this.history(k);
    const hw = this.history(k + 1);
    const damping = w0 / quality;
    const y = (w0 * w0 * p - hw - hy * (a0 + damping)) / (a0 * a0 + a0 * damping + w0 * w0);
    this.q[k] = y;
    this.q[k + 1] = a0 * y + hy;
    return y;
  }
}
