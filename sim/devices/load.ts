/** Load (a console or recorder input): resistance ∥ capacitance between p and n; either may be absent. */
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
import { thermalCurrentPsd } from "./physics";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles } from "./stamps";

class Load implements Device {
  readonly part: ElaboratedPart;
  private readonly p: number;
  private readonly n: number;
  private resistive: TwoTerminalHandles | null = null;
  private capacitive: TwoTerminalHandles | null = null;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.p = wiring.pins.p;
    this.n = wiring.pins.n;
  }
  /** 1/R, 0 for an infinite resistance, S */
  private conductance(): number {
    const r = numberValue(this.part, "resistance");
    return Number.isFinite(r) ? 1 / r : 0;
  }
  declare(p: PatternBuilder): void {
    if (this.conductance() > 0) this.resistive = declareTwoTerminal(p, this.p, this.n);
    if (numberValue(this.part, "capacitance") > 0) {
      this.capacitive = declareTwoTerminal(p, this.p, this.n, { acOnly: true });
    }
  }
  startNewton(): void {}
  stampDc(ctx: DcStampContext): void {
    if (this.resistive) stampTwoTerminal(ctx.add, this.resistive, this.conductance());
  }
  stampAc(ctx: AcStampContext): void {
    if (this.resistive) stampTwoTerminal(ctx.addConductance, this.resistive, this.conductance());
    if (this.capacitive) stampTwoTerminal(ctx.addReactance, this.capacitive, numberValue(this.part, "capacitance"));
  }
  transientStateCount(): number {
    return 1;
  }
  stampTransient(ctx: TransientStampContext): void {
    this.stampDc(ctx);
    if (this.capacitive) ctx.capacitance(0, this.capacitive, this.p, this.n, numberValue(this.part, "capacitance"));
  }
  report() {
    return null;
  }
  noiseSources(op: OperatingPointView) {
    const g = this.conductance();
    if (this.part.noiseless || g === 0) return [];
    const psd = thermalCurrentPsd(op.temperature, g);
    return [{ part: this.part.id, label: "thermal", plus: this.p, minus: this.n, psd: () => psd }];
  }
}

export const loadKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new Load(part, wiring),
};
