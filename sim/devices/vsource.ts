/**
 * Independent voltage source: branch current I from p through the source to n, branch row V(p) − V(n) = value.
 * DC value `dc` (scaled during source stepping); AC drive `ac`∠`ac_phase`. Reported current is the current
 * pushed out of the p pin into the circuit, −I.
 */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import {
  type AcDriveContext,
  type AcStampContext,
  type DcStampContext,
  type Device,
  type DeviceKind,
  type DeviceWiring,
  numberValue,
  type OperatingPointView,
  type TransientStampContext,
} from "./device";
import { type BranchHandles, declareBranch, stampBranchIncidence } from "./stamps";

const DEGREES_TO_RADIANS = Math.PI / 180;

class VoltageSource implements Device {
  readonly part: ElaboratedPart;
  private readonly p: number;
  private readonly n: number;
  private readonly branch: number;
  private h!: BranchHandles;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.p = wiring.pins.p;
    this.n = wiring.pins.n;
    this.branch = wiring.extra[0];
  }
  declare(pattern: PatternBuilder): void {
    this.h = declareBranch(pattern, this.p, this.n, this.branch);
  }
  startNewton(): void {}
  stampDc(ctx: DcStampContext): void {
    stampBranchIncidence(ctx.add, this.h);
    ctx.addRhs(this.branch, numberValue(this.part, "dc") * ctx.sourceScale);
  }
  stampTransient(ctx: TransientStampContext): void {
    stampBranchIncidence(ctx.add, this.h);
    ctx.addRhs(this.branch, ctx.sourceValue(this.part));
  }
  stampAc(ctx: AcStampContext): void {
    stampBranchIncidence(ctx.addConductance, this.h);
  }
  stampAcDrive(ctx: AcDriveContext): void {
    const amplitude = numberValue(this.part, "ac");
    if (amplitude === 0) return;
    const phase = numberValue(this.part, "ac_phase") * DEGREES_TO_RADIANS;
    ctx.addRhs(this.branch, amplitude * Math.cos(phase), amplitude * Math.sin(phase));
  }
  report(op: OperatingPointView) {
    return { values: { current: -op.x[this.branch] }, warnings: [] };
  }
  noiseSources() {
    return [];
  }
}

export const vsourceKind: DeviceKind = {
  extraUnknowns: () => [{ label: "source current", kind: "current" }],
  create: (part, wiring) => new VoltageSource(part, wiring),
};
