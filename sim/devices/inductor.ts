/** Inductor with optional series resistance, as a branch current (series-branch.ts): a short at DC. */
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
  type TransientStampContext,
} from "./device";
import { SeriesBranch } from "./series-branch";

class Inductor implements Device {
  readonly part: ElaboratedPart;
  private readonly element: SeriesBranch;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.element = new SeriesBranch(wiring.pins.a, wiring.pins.b, wiring.extra[0]);
  }
  private resistance(): number {
    return numberValue(this.part, "series_resistance");
  }
  declare(p: PatternBuilder): void {
    this.element.declare(p);
  }
  startNewton(): void {}
  stampDc(ctx: DcStampContext): void {
    this.element.stampDc(ctx, this.resistance());
  }
  stampAc(ctx: AcStampContext): void {
    this.element.stampAc(ctx, this.resistance(), numberValue(this.part, "inductance"));
  }
  transientStateCount(): number {
    return 1;
  }
  stampTransient(ctx: TransientStampContext): void {
    this.element.stampTransient(ctx, 0, this.resistance(), numberValue(this.part, "inductance"));
  }
  report(op: OperatingPointView) {
    return { values: { current: op.x[this.element.branch] }, warnings: [] };
  }
  noiseSources(op: OperatingPointView) {
    if (this.part.noiseless) return [];
    return this.element.thermalNoise(this.part.id, op.temperature, this.resistance());
  }
}

export const inductorKind: DeviceKind = {
  extraUnknowns: () => [{ label: "winding current", kind: "current" }],
  create: (part, wiring) => new Inductor(part, wiring),
};
