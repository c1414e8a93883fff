/** Resistor: conductance 1/R between a and b, DC and AC; thermal noise 4kT/R as a current generator. */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import { type Device, type DeviceKind, type DeviceWiring, numberValue } from "./device";
import { thermalCurrentPsd } from "./physics";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles } from "./stamps";

class Resistor implements Device {
  readonly part: ElaboratedPart;
  private readonly a: number;
  private readonly b: number;
  private h!: TwoTerminalHandles;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.a = wiring.pins.a;
    this.b = wiring.pins.b;
  }

  private conductance(): number {
    return 1 / numberValue(this.part, "resistance");
  }

  declare(p: PatternBuilder): void {
    this.h = declareTwoTerminal(p, this.a, this.b);
  }
  startNewton(): void {}
  stampDc(ctx: Parameters<Device["stampDc"]>[0]): void {
    stampTwoTerminal(ctx.add, this.h, this.conductance());
  }
  stampAc(ctx: Parameters<Device["stampAc"]>[0]): void {
    stampTwoTerminal(ctx.addConductance, this.h, this.conductance());
  }
  report() {
    return null;
  }
  noiseSources(op: Parameters<Device["noiseSources"]>[0]) {
    if (this.part.noiseless) return [];
    const psd = thermalCurrentPsd(op.temperature, this.conductance());
    return [{ part: this.part.id, label: "thermal", plus: this.a, minus: this.b, psd: () => psd }];
  }
}

export const resistorKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new Resistor(part, wiring),
};
