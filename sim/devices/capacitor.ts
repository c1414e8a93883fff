/** Capacitor: open at DC; jωC between a and b in the small-signal system. Noiseless. */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import {
  type AcStampContext,
  type Device,
  type DeviceKind,
  type DeviceWiring,
  numberValue,
  type TransientStampContext,
} from "./device";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles } from "./stamps";

class Capacitor implements Device {
  readonly part: ElaboratedPart;
  private readonly a: number;
  private readonly b: number;
  private h!: TwoTerminalHandles;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.a = wiring.pins.a;
    this.b = wiring.pins.b;
  }
  declare(p: PatternBuilder): void {
    this.h = declareTwoTerminal(p, this.a, this.b, { acOnly: true });
  }
  startNewton(): void {}
  stampDc(): void {}
  stampAc(ctx: AcStampContext): void {
    stampTwoTerminal(ctx.addReactance, this.h, numberValue(this.part, "capacitance"));
  }
  transientStateCount(): number {
    return 1;
  }
  stampTransient(ctx: TransientStampContext): void {
    ctx.capacitance(0, this.h, this.a, this.b, numberValue(this.part, "capacitance"));
  }
  report() {
    return null;
  }
  noiseSources() {
    return [];
  }
}

export const capacitorKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new Capacitor(part, wiring),
};
