/**
 * The small-signal model of a circuit at an operating point: G and C stamped once (sim/mna/complex-system.ts),
 * then any number of frequencies. Gives the response V(plus) − V(minus) to the circuit's drive (every source's
 * `ac` and every capsule at `pressure`) and the output impedance (1 A injected into plus and out of minus with
 * every drive off: Z = V(plus) − V(minus) per ampere).
 */
import type { AcDriveContext, AcStampContext, Device } from "../devices/device";
import { ComplexSystem } from "../mna/complex-system";
import { SingularMatrixError } from "../mna/singular";
import { type CompiledCircuit, singularCircuitError } from "./compile";
import type { OperatingPoint } from "./op";

export interface ComplexValue {
  re: number;
  im: number;
}

export class SmallSignalModel {
  readonly compiled: CompiledCircuit;
  readonly op: OperatingPoint;
  private readonly system: ComplexSystem;
  private readonly drivers: Device[];
  private readonly rhsRe: Float64Array;
  private readonly rhsIm: Float64Array;
  private readonly solRe: Float64Array;
  private readonly solIm: Float64Array;
  private readonly plus: number;
  private readonly minus: number;
  private factoredOmega = Number.NaN;
  private readonly drive: DriveContext;

  constructor(compiled: CompiledCircuit, op: OperatingPoint) {
    this.compiled = compiled;
    this.op = op;
    const n = compiled.unknowns.length;
    this.system = new ComplexSystem(compiled.ac);
    this.rhsRe = new Float64Array(n + 1);
    this.rhsIm = new Float64Array(n + 1);
    this.solRe = new Float64Array(n);
    this.solIm = new Float64Array(n);
    this.plus = compiled.netIndex.get(compiled.circuit.output.plus) ?? -1;
    this.minus = compiled.netIndex.get(compiled.circuit.output.minus) ?? -1;
    this.drivers = compiled.devices.filter((d) => d.stampAcDrive !== undefined);
    const positions = compiled.ac.positionOfHandle;
    const { conductance, reactance } = this.system;
    const ctx: AcStampContext = {
      x: op.x,
      thermalVoltage: op.thermalVoltage,
      addConductance: (h, v) => {
        conductance[positions[h]] += v;
      },
      addReactance: (h, v) => {
        reactance[positions[h]] += v;
      },
    };
    for (const d of compiled.devices) d.stampAc(ctx);
    this.drive = new DriveContext(op.x, this.rhsRe, this.rhsIm);
  }

  /** G by storage position of the AC structure, as stamped at the operating point (read-only for others) */
  get conductance(): Float64Array {
    return this.system.conductance;
  }

  /** C by storage position (capacitances, −L on inductor branch rows), as stamped (read-only for others) */
  get reactance(): Float64Array {
    return this.system.reactance;
  }

  /** how many frequencies needed the dense fallback */
  get denseFallbacks(): number {
    return this.system.denseFallbacks;
  }

  private factor(frequency: number): void {
    const omega = 2 * Math.PI * frequency;
    if (omega === this.factoredOmega) return;
    try {
      this.system.factorAt(omega);
    } catch (e) {
      if (e instanceof SingularMatrixError) throw singularCircuitError(this.compiled.unknowns, e.unknown, "ac-solve");
      throw e;
    }
    this.factoredOmega = omega;
  }

  private solveOutput(out: ComplexValue): void {
    this.system.solve(this.rhsRe, this.rhsIm, this.solRe, this.solIm);
    out.re = (this.plus < 0 ? 0 : this.solRe[this.plus]) - (this.minus < 0 ? 0 : this.solRe[this.minus]);
    out.im = (this.plus < 0 ? 0 : this.solIm[this.plus]) - (this.minus < 0 ? 0 : this.solIm[this.minus]);
  }

  /** V(plus) − V(minus) for the circuit's drive at `frequency` (Hz), capsules at `pressure` (Pa). */
  response(frequency: number, pressure: number, out: ComplexValue = { re: 0, im: 0 }): ComplexValue {
    this.factor(frequency);
    this.rhsRe.fill(0);
    this.rhsIm.fill(0);
    const ctx = this.drive;
    ctx.frequency = frequency;
    ctx.pressure = pressure;
    for (const d of this.drivers) d.stampAcDrive!(ctx);
    this.solveOutput(out);
    return out;
  }

  /** Output impedance at `frequency`, Ω (complex), every drive off. */
  outputImpedance(frequency: number, out: ComplexValue = { re: 0, im: 0 }): ComplexValue {
    this.factor(frequency);
    this.rhsRe.fill(0);
    this.rhsIm.fill(0);
    if (this.plus >= 0) this.rhsRe[this.plus] += 1;
    if (this.minus >= 0) this.rhsRe[this.minus] -= 1;
    this.solveOutput(out);
    return out;
  }
}

/** The drive context, reused for every frequency (no allocation per point); also the spread's reduced sweep's. */
export class DriveContext implements AcDriveContext {
  readonly x: Float64Array;
  frequency = 0;
  pressure = 0;
  private readonly rhsRe: Float64Array;
  private readonly rhsIm: Float64Array;

  constructor(x: Float64Array, rhsRe: Float64Array, rhsIm: Float64Array) {
    this.x = x;
    this.rhsRe = rhsRe;
    this.rhsIm = rhsIm;
  }

  addRhs(row: number, re: number, im: number): void {
    if (row < 0) return;
    this.rhsRe[row] += re;
    this.rhsIm[row] += im;
  }
}
