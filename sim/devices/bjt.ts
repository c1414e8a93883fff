/**
 * Bipolar transistor device (model in bjt-model.ts). pnp: every terminal voltage and current of the npn equations
 * is negated. An rbb > 0 puts an internal base node b′ behind a base resistance; the junctions sit at b′.
 * Limiting: both junction voltages are limited with the exponential-junction rule (limiting.ts).
 *
 * Regions (Backplate's reading of the junction currents): a junction conducts when its transport current exceeds
 * BJT_CONDUCTING_CURRENT_A; with both conducting, the transistor is saturated when the reverse transport current
 * exceeds BJT_SATURATION_RATIO of the forward one (for equal saturation currents that is Vce below about
 * Vt·ln(1/0.01) ≈ 0.12 V) — and reverse-active in the mirror case.
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
  type RegionMargin,
  type TransientStampContext,
} from "./device";
import { type BjtParameters, type BjtPoint, bjtCurrents } from "./bjt-model";
import { criticalJunctionVoltage, limitJunctionVoltage } from "./limiting";
import { shotPsd, thermalCurrentPsd } from "./physics";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles, voltageAt } from "./stamps";
import { TerminalBlock } from "./terminal-block";

export const BJT_CONDUCTING_CURRENT_A = 1e-9;
export const BJT_SATURATION_RATIO = 0.01;

export type BjtRegion = "cut-off" | "active" | "saturation" | "reverse";

const COLLECTOR = 0;
const BASE = 1;
const EMITTER = 2;

export function bjtRegion(point: BjtPoint): BjtRegion {
  const f = point.forwardTransport;
  const r = point.reverseTransport;
  const forwardOn = f > BJT_CONDUCTING_CURRENT_A;
  const reverseOn = r > BJT_CONDUCTING_CURRENT_A;
  if (forwardOn && (!reverseOn || r < BJT_SATURATION_RATIO * f)) return "active";
  if (reverseOn && (!forwardOn || f < BJT_SATURATION_RATIO * r)) return "reverse";
  if (forwardOn && reverseOn) return "saturation";
  return "cut-off";
}

class Bjt implements Device {
  readonly part: ElaboratedPart;
  private readonly collector: number;
  private readonly externalBase: number;
  private readonly innerBase: number;
  private readonly emitter: number;
  private readonly block: TerminalBlock;
  private baseResistance: TwoTerminalHandles | null = null;
  private cpi!: TwoTerminalHandles;
  private cmu!: TwoTerminalHandles;
  private lastVbe = 0;
  private lastVbc = 0;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.collector = wiring.pins.c;
    this.externalBase = wiring.pins.b;
    this.innerBase = wiring.extra.length > 0 ? wiring.extra[0] : wiring.pins.b;
    this.emitter = wiring.pins.e;
    this.block = new TerminalBlock([this.collector, this.innerBase, this.emitter]);
  }
  private sign(): number {
    return this.part.values.type === "pnp" ? -1 : 1;
  }
  private parameters(): BjtParameters {
    return {
      is: numberValue(this.part, "is"),
      beta: numberValue(this.part, "beta"),
      betaR: numberValue(this.part, "beta_r"),
      vaf: numberValue(this.part, "vaf"),
    };
  }
  /** npn-frame junction voltages (Vbe, Vbc) at iterate x */
  private junctions(x: Float64Array): [number, number] {
    const s = this.sign();
    const vb = voltageAt(x, this.innerBase);
    return [s * (vb - voltageAt(x, this.emitter)), s * (vb - voltageAt(x, this.collector))];
  }
  declare(p: PatternBuilder): void {
    this.block.declare(p);
    if (this.innerBase !== this.externalBase) {
      this.baseResistance = declareTwoTerminal(p, this.externalBase, this.innerBase);
    }
    this.cpi = declareTwoTerminal(p, this.innerBase, this.emitter, { acOnly: true });
    this.cmu = declareTwoTerminal(p, this.innerBase, this.collector, { acOnly: true });
  }
  startNewton(x: Float64Array): void {
    [this.lastVbe, this.lastVbc] = this.junctions(x);
  }
  private linearise(vbe: number, vbc: number, vt: number, x: Float64Array): BjtPoint {
    const s = this.sign();
    const point = bjtCurrents(vbe, vbc, vt, this.parameters());
    const b = this.block;
    b.clear();
    const vb = voltageAt(x, this.innerBase);
    b.voltage[BASE] = vb;
    b.voltage[EMITTER] = vb - s * vbe;
    b.voltage[COLLECTOR] = vb - s * vbc;
    b.current[COLLECTOR] = s * point.ic;
    b.current[BASE] = s * point.ib;
    b.current[EMITTER] = -s * (point.ic + point.ib);
    // Vbe = Vb − Ve, Vbc = Vb − Vc (real terminals); conductances keep their sign under the pnp mirror.
    const rows: Array<[number, number, number]> = [
      [COLLECTOR, point.dIcDvbe, point.dIcDvbc],
      [BASE, point.dIbDvbe, point.dIbDvbc],
      [EMITTER, -(point.dIcDvbe + point.dIbDvbe), -(point.dIcDvbc + point.dIbDvbc)],
    ];
    const j = b.jacobian;
    for (const [r, dVbe, dVbc] of rows) {
      j[r * 3 + BASE] = dVbe + dVbc;
      j[r * 3 + EMITTER] = -dVbe;
      j[r * 3 + COLLECTOR] = -dVbc;
    }
    return point;
  }
  private stampBase(add: (h: number, v: number) => void): void {
    if (this.baseResistance) stampTwoTerminal(add, this.baseResistance, 1 / numberValue(this.part, "rbb"));
  }
  stampDc(ctx: DcStampContext): void {
    const vt = ctx.thermalVoltage;
    const vcrit = criticalJunctionVoltage(vt, numberValue(this.part, "is"));
    const [vbe, vbc] = this.junctions(ctx.x);
    const limitedVbe = limitJunctionVoltage(vbe, this.lastVbe, vt, vcrit);
    const limitedVbc = limitJunctionVoltage(vbc, this.lastVbc, vt, vcrit);
    if (limitedVbe !== vbe || limitedVbc !== vbc) ctx.markLimited();
    this.lastVbe = limitedVbe;
    this.lastVbc = limitedVbc;
    this.linearise(limitedVbe, limitedVbc, vt, ctx.x);
    this.block.stampDc(ctx);
    this.stampBase(ctx.add);
  }
  /** stored quantities: the charges of cpi and cmu */
  transientStateCount(): number {
    return 2;
  }
  stampTransient(ctx: TransientStampContext): void {
    this.stampDc(ctx);
    ctx.capacitance(0, this.cpi, this.innerBase, this.emitter, numberValue(this.part, "cpi"));
    ctx.capacitance(1, this.cmu, this.innerBase, this.collector, numberValue(this.part, "cmu"));
  }
  /**
   * Nearest boundary of the active region, in the regions' own terms (bjtRegion): cut-off where the forward
   * transport current falls to BJT_CONDUCTING_CURRENT_A, saturation where the reverse one reaches
   * BJT_SATURATION_RATIO of the forward one.
   */
  regionMargin(x: Float64Array, vt: number): RegionMargin {
    const [vbe, vbc] = this.junctions(x);
    const cutOff = vbe - vt * Math.log(BJT_CONDUCTING_CURRENT_A / numberValue(this.part, "is") + 1);
    const saturation = vbe + vt * Math.log(BJT_SATURATION_RATIO) - vbc;
    return cutOff < saturation ? { margin: cutOff, reason: "cut-off" } : { margin: saturation, reason: "saturation" };
  }
  stampAc(ctx: AcStampContext): void {
    const [vbe, vbc] = this.junctions(ctx.x);
    this.linearise(vbe, vbc, ctx.thermalVoltage, ctx.x);
    this.block.stampAc(ctx);
    this.stampBase(ctx.addConductance);
    stampTwoTerminal(ctx.addReactance, this.cpi, numberValue(this.part, "cpi"));
    stampTwoTerminal(ctx.addReactance, this.cmu, numberValue(this.part, "cmu"));
  }
  report(op: OperatingPointView) {
    const [vbe, vbc] = this.junctions(op.x);
    const point = this.linearise(vbe, vbc, op.thermalVoltage, op.x);
    const region = bjtRegion(point);
    const outputConductance = -point.dIcDvbc; // ∂Ic/∂Vce at fixed Vbe
    const warnings =
      region === "saturation"
        ? [
            {
              part: this.part.id,
              message: `${this.part.id}: saturated (collector–emitter voltage too low for active operation) — reduce the collector load or the base drive`,
            },
          ]
        : [];
    return {
      values: {
        region,
        ic: this.sign() * point.ic,
        ib: this.sign() * point.ib,
        gm: point.dIcDvbe,
        rpi: point.dIbDvbe > 0 ? 1 / point.dIbDvbe : null,
        ro: outputConductance > 0 ? 1 / outputConductance : null,
      },
      warnings,
    };
  }
  noiseSources(op: OperatingPointView) {
    if (this.part.noiseless) return [];
    const [vbe, vbc] = this.junctions(op.x);
    const point = this.linearise(vbe, vbc, op.thermalVoltage, op.x);
    const collectorShot = shotPsd(point.ic);
    const baseShot = shotPsd(point.ib);
    const id = this.part.id;
    const out = [
      { part: id, label: "collector shot", plus: this.collector, minus: this.emitter, psd: () => collectorShot },
      { part: id, label: "base shot", plus: this.innerBase, minus: this.emitter, psd: () => baseShot },
    ];
    if (this.baseResistance) {
      const thermal = thermalCurrentPsd(op.temperature, 1 / numberValue(this.part, "rbb"));
      out.push({
        part: id,
        label: "base resistance",
        plus: this.externalBase,
        minus: this.innerBase,
        psd: () => thermal,
      });
    }
    return out;
  }
}

export const bjtKind: DeviceKind = {
  extraUnknowns: (part) => {
    const rbb = part.values.rbb;
    return typeof rbb === "number" && rbb > 0 ? [{ label: "inner base node", kind: "voltage" as const }] : [];
  },
  create: (part, wiring) => new Bjt(part, wiring),
};
