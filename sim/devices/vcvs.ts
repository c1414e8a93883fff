/** Voltage-controlled voltage source: V(p) − V(n) = gain·(V(cp) − V(cn)), with its output branch current. */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import {
  type AcStampContext,
  type DcStampContext,
  type Device,
  type DeviceKind,
  type DeviceWiring,
  numberValue,
  type OperatingPointView,
} from "./device";
import { type BranchHandles, declareBranch, stampBranchIncidence } from "./stamps";

class VoltageControlledVoltageSource implements Device {
  readonly part: ElaboratedPart;
  private readonly branch: number;
  private readonly pins: Record<string, number>;
  private h!: BranchHandles;
  private controlPlus!: number;
  private controlMinus!: number;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.pins = wiring.pins;
    this.branch = wiring.extra[0];
  }
  declare(p: PatternBuilder): void {
    this.h = declareBranch(p, this.pins.p, this.pins.n, this.branch);
    this.controlPlus = p.entry(this.branch, this.pins.cp);
    this.controlMinus = p.entry(this.branch, this.pins.cn);
  }
  startNewton(): void {}
  private stamp(add: (h: number, v: number) => void): void {
    const gain = numberValue(this.part, "gain");
    stampBranchIncidence(add, this.h);
    add(this.controlPlus, -gain);
    add(this.controlMinus, gain);
  }
  stampDc(ctx: DcStampContext): void {
    this.stamp(ctx.add);
  }
  stampAc(ctx: AcStampContext): void {
    this.stamp(ctx.addConductance);
  }
  report(op: OperatingPointView) {
    return { values: { current: -op.x[this.branch] }, warnings: [] };
  }
  noiseSources() {
    return [];
  }
}

export const vcvsKind: DeviceKind = {
  extraUnknowns: () => [{ label: "output current", kind: "current" }],
  create: (part, wiring) => new VoltageControlledVoltageSource(part, wiring),
};
