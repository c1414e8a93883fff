/**
 * Transformer (contract): primary_resistance and leakage_inductance in series with the primary (one branch
 * p1 → p1′, series-branch.ts), primary_inductance across the ideal primary (branch p1′ → p2), secondary_resistance
 * in series with the secondary and secondary_capacitance across s1–s2. Ideal part, dots on p1 and s1:
 * V(s1′) − V(s2) = ratio·(V(p1′) − V(p2)) with ratio = Ns/Np.
 *
 * The secondary branch current Is flows from s1 through the secondary resistance and the ideal winding to s2; its
 * row reads V(s1) − V(s2) − Rs·Is − ratio·(V(p1′) − V(p2)) = 0. Power balance of the ideal part puts −ratio·Is
 * into the ideal primary at p1′ (and +ratio·Is at p2). Unknowns beyond the pins: p1′, the primary current, the
 * magnetising current and Is.
 */
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
import { thermalVoltagePsd } from "./physics";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles } from "./stamps";
import { SeriesBranch } from "./series-branch";

class Transformer implements Device {
  readonly part: ElaboratedPart;
  private readonly pins: Record<string, number>;
  private readonly innerPrimary: number;
  private readonly secondaryCurrent: number;
  private readonly primarySeries: SeriesBranch;
  private readonly magnetising: SeriesBranch;
  private h!: {
    s1k: number;
    s2k: number;
    p1k: number;
    p2k: number;
    ks1: number;
    ks2: number;
    kp1: number;
    kp2: number;
    kk: number;
  };
  private secondaryShunt!: TwoTerminalHandles;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.pins = wiring.pins;
    const [inner, primaryCurrent, magnetisingCurrent, secondaryCurrent] = wiring.extra;
    this.innerPrimary = inner;
    this.secondaryCurrent = secondaryCurrent;
    this.primarySeries = new SeriesBranch(wiring.pins.p1, inner, primaryCurrent);
    this.magnetising = new SeriesBranch(inner, wiring.pins.p2, magnetisingCurrent);
  }

  declare(p: PatternBuilder): void {
    this.primarySeries.declare(p);
    this.magnetising.declare(p);
    const k = this.secondaryCurrent;
    const { s1, s2, p2 } = this.pins;
    const p1 = this.innerPrimary;
    this.h = {
      s1k: p.entry(s1, k),
      s2k: p.entry(s2, k),
      p1k: p.entry(p1, k),
      p2k: p.entry(p2, k),
      ks1: p.entry(k, s1),
      ks2: p.entry(k, s2),
      kp1: p.entry(k, p1),
      kp2: p.entry(k, p2),
      kk: p.entry(k, k, { weak: true }),
    };
    this.secondaryShunt = declareTwoTerminal(p, s1, s2, { acOnly: true });
  }

  private stampIdeal(add: (h: number, v: number) => void): void {
    const n = numberValue(this.part, "ratio");
    const h = this.h;
    add(h.s1k, 1);
    add(h.s2k, -1);
    add(h.p1k, -n);
    add(h.p2k, n);
    add(h.ks1, 1);
    add(h.ks2, -1);
    add(h.kp1, -n);
    add(h.kp2, n);
    add(h.kk, -numberValue(this.part, "secondary_resistance"));
  }

  startNewton(): void {}
  stampDc(ctx: DcStampContext): void {
    this.primarySeries.stampDc(ctx, numberValue(this.part, "primary_resistance"));
    this.magnetising.stampDc(ctx, 0);
    this.stampIdeal(ctx.add);
  }
  stampAc(ctx: AcStampContext): void {
    this.primarySeries.stampAc(
      ctx,
      numberValue(this.part, "primary_resistance"),
      numberValue(this.part, "leakage_inductance"),
    );
    this.magnetising.stampAc(ctx, 0, numberValue(this.part, "primary_inductance"));
    this.stampIdeal(ctx.addConductance);
    stampTwoTerminal(ctx.addReactance, this.secondaryShunt, numberValue(this.part, "secondary_capacitance"));
  }
  /** stored quantities: leakage flux, magnetising flux, secondary capacitance charge */
  transientStateCount(): number {
    return 3;
  }
  stampTransient(ctx: TransientStampContext): void {
    this.primarySeries.stampTransient(
      ctx,
      0,
      numberValue(this.part, "primary_resistance"),
      numberValue(this.part, "leakage_inductance"),
    );
    this.magnetising.stampTransient(ctx, 1, 0, numberValue(this.part, "primary_inductance"));
    this.stampIdeal(ctx.add);
    const { s1, s2 } = this.pins;
    ctx.capacitance(2, this.secondaryShunt, s1, s2, numberValue(this.part, "secondary_capacitance"));
  }
  report() {
    return null;
  }
  noiseSources(op: OperatingPointView) {
    if (this.part.noiseless) return [];
    const out = this.primarySeries.thermalNoise(
      this.part.id,
      op.temperature,
      numberValue(this.part, "primary_resistance"),
    );
    const rs = numberValue(this.part, "secondary_resistance");
    if (rs > 0) {
      const psd = thermalVoltagePsd(op.temperature, rs);
      out.push({ part: this.part.id, label: "thermal", plus: this.secondaryCurrent, minus: -1, psd: () => psd });
    }
    return out;
  }
}

export const transformerKind: DeviceKind = {
  extraUnknowns: () => [
    { label: "inner primary node", kind: "voltage" },
    { label: "primary current", kind: "current" },
    { label: "magnetising current", kind: "current" },
    { label: "secondary current", kind: "current" },
  ],
  create: (part, wiring) => new Transformer(part, wiring),
};
