/**
 * Independent current source: a positive value takes current from net p and delivers it into net n (contract).
 * Reported current follows the sources' rule (positive when pushed out of the p pin into the circuit): −dc.
 */
import type { ElaboratedPart } from "../circuit/types";
import {
  type AcDriveContext,
  type DcStampContext,
  type Device,
  type DeviceKind,
  type DeviceWiring,
  numberValue,
  type TransientStampContext,
} from "./device";

const DEGREES_TO_RADIANS = Math.PI / 180;

class CurrentSource implements Device {
  readonly part: ElaboratedPart;
  private readonly p: number;
  private readonly n: number;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.p = wiring.pins.p;
    this.n = wiring.pins.n;
  }
  declare(): void {}
  startNewton(): void {}
  stampDc(ctx: DcStampContext): void {
    const current = numberValue(this.part, "dc") * ctx.sourceScale;
    // Leaving p through the source is +current in row p; moved to the right-hand side.
    ctx.addRhs(this.p, -current);
    ctx.addRhs(this.n, current);
  }
  stampTransient(ctx: TransientStampContext): void {
    const current = ctx.sourceValue(this.part);
    ctx.addRhs(this.p, -current);
    ctx.addRhs(this.n, current);
  }
  stampAc(): void {}
  stampAcDrive(ctx: AcDriveContext): void {
    const amplitude = numberValue(this.part, "ac");
    if (amplitude === 0) return;
    const phase = numberValue(this.part, "ac_phase") * DEGREES_TO_RADIANS;
    const re = amplitude * Math.cos(phase);
    const im = amplitude * Math.sin(phase);
    ctx.addRhs(this.p, -re, -im);
    ctx.addRhs(this.n, re, im);
  }
  report() {
    return { values: { current: -numberValue(this.part, "dc") }, warnings: [] };
  }
  noiseSources() {
    return [];
  }
}

export const isourceKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new CurrentSource(part, wiring),
};
