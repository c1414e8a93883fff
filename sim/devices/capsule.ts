/**
 * Condenser capsule (contract): an EMF e in series with `capacitance` between diaphragm and backplate,
 *   e = −(V0 + electret_voltage) · strain_per_pa · p · H(f),
 * V0 = V(diaphragm) − V(backplate) at the DC operating point, p the drive in Pa, and
 * H(f) = 1 / (1 − (f/f0)² + j·(f/f0)/q) when `resonance` f0 is given, else 1.
 * Open at DC. In the small-signal system the series pair is stamped as its Norton equivalent: jωC across the pins
 * and a current jωC·e injected into the diaphragm net (out of the backplate net), which needs no extra unknown:
 * the branch current is i = jωC·(V(d) − V(b) − e).
 */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import {
  type AcDriveContext,
  type AcStampContext,
  type Device,
  type DeviceKind,
  type DeviceWiring,
  numberValue,
  type OperatingPointView,
  optionalNumber,
  type TransientStampContext,
} from "./device";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles, voltageAt } from "./stamps";

/** Complex resonance factor H(f) of the contract, as [re, im]. */
export function capsuleResonance(frequency: number, resonance: number | undefined, q: number): [number, number] {
  if (resonance === undefined) return [1, 0];
  const r = frequency / resonance;
  const dr = 1 - r * r;
  const di = r / q;
  const mag2 = dr * dr + di * di;
  return [dr / mag2, -di / mag2];
}

class Capsule implements Device {
  readonly part: ElaboratedPart;
  private readonly diaphragm: number;
  private readonly backplate: number;
  private h!: TwoTerminalHandles;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.diaphragm = wiring.pins.diaphragm;
    this.backplate = wiring.pins.backplate;
  }

  /** V0 + electret_voltage at the operating point, V */
  polarisation(x: Float64Array): number {
    const v0 = voltageAt(x, this.diaphragm) - voltageAt(x, this.backplate);
    return v0 + numberValue(this.part, "electret_voltage");
  }

  declare(p: PatternBuilder): void {
    this.h = declareTwoTerminal(p, this.diaphragm, this.backplate, { acOnly: true });
  }
  startNewton(): void {}
  stampDc(): void {}
  stampAc(ctx: AcStampContext): void {
    stampTwoTerminal(ctx.addReactance, this.h, numberValue(this.part, "capacitance"));
  }
  stampAcDrive(ctx: AcDriveContext): void {
    if (ctx.pressure === 0) return;
    const [hr, hi] = capsuleResonance(
      ctx.frequency,
      optionalNumber(this.part, "resonance"),
      numberValue(this.part, "q"),
    );
    const scale = -this.polarisation(ctx.x) * numberValue(this.part, "strain_per_pa") * ctx.pressure;
    const er = scale * hr;
    const ei = scale * hi;
    // jωC·e = ωC·(−Im e + j·Re e)
    const wc = 2 * Math.PI * ctx.frequency * numberValue(this.part, "capacitance");
    ctx.addRhs(this.diaphragm, -wc * ei, wc * er);
    ctx.addRhs(this.backplate, wc * ei, -wc * er);
  }
  /** stored quantities: the charge, then the resonance filter's two states */
  transientStateCount(): number {
    return 3;
  }
  /**
   * Transient: the EMF e(t) = −(V0 + electret_voltage)·strain_per_pa·p(t), p through the resonance filter when
   * `resonance` is given, V0 from the DC operating point, in series with the capacitance.
   */
  stampTransient(ctx: TransientStampContext): void {
    const pressure = ctx.capsulePressure(1, optionalNumber(this.part, "resonance"), numberValue(this.part, "q"));
    const emf = -this.polarisation(ctx.operatingPoint) * numberValue(this.part, "strain_per_pa") * pressure;
    ctx.capacitance(0, this.h, this.diaphragm, this.backplate, numberValue(this.part, "capacitance"), emf);
  }
  report(op: OperatingPointView) {
    return { values: { polarisation: this.polarisation(op.x) }, warnings: [] };
  }
  noiseSources() {
    return [];
  }
}

export const capsuleKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new Capsule(part, wiring),
};
