/** Voltage-controlled current source: gm·(V(cp) − V(cn)) taken from net p and delivered into net n. */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import {
  type AcStampContext,
  type DcStampContext,
  type Device,
  type DeviceKind,
  type DeviceWiring,
  numberValue,
} from "./device";
import { declareTransconductance, stampTransconductance, type TransconductanceHandles } from "./stamps";

class VoltageControlledCurrentSource implements Device {
  readonly part: ElaboratedPart;
  private readonly pins: Record<string, number>;
  private h!: TransconductanceHandles;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.pins = wiring.pins;
  }
  declare(p: PatternBuilder): void {
    const { p: out, n, cp, cn } = this.pins;
    this.h = declareTransconductance(p, out, n, cp, cn);
  }
  startNewton(): void {}
  stampDc(ctx: DcStampContext): void {
    stampTransconductance(ctx.add, this.h, numberValue(this.part, "transconductance"));
  }
  stampAc(ctx: AcStampContext): void {
    stampTransconductance(ctx.addConductance, this.h, numberValue(this.part, "transconductance"));
  }
  report() {
    return null;
  }
  noiseSources() {
    return [];
  }
}

export const vccsKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new VoltageControlledCurrentSource(part, wiring),
};
