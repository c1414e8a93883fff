/**
 * JFET device (model in jfet-model.ts). p-type: every voltage, the pinch-off and the current are negated, so the
 * conductances with respect to the real terminal voltages keep their sign. Gate current is zero; the gate is
 * only warned about when forward-biased by more than JFET_GATE_FORWARD_WARNING_V. Limiting: the gate–source
 * voltage moves by at most JFET_GATE_STEP_FRACTION·|pinch_off| per Newton iteration, so a step cannot jump across
 * cut-off (zero derivative) in one go.
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
import { jfetDrainCurrent, type JfetParameters } from "./jfet-model";
import { limitStep } from "./limiting";
import { BOLTZMANN_J_PER_K } from "../constants";
import { shotPsd } from "./physics";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles, voltageAt } from "./stamps";
import { TerminalBlock } from "./terminal-block";

/** Contract: warn when the gate junction is forward-biased by more than 0.5 V. */
export const JFET_GATE_FORWARD_WARNING_V = 0.5;
/** Largest gate–source step per Newton iteration, as a fraction of |pinch_off|. */
export const JFET_GATE_STEP_FRACTION = 0.5;

const DRAIN = 0;
const GATE = 1;
const SOURCE = 2;

/** What a JFET out of drain headroom has entered, in the JFET's own terms (RegionMargin.detail). */
export const JFET_HEADROOM_DETAIL = "ohmic (triode) region: Vds below Vgs − Vp";

class Jfet implements Device {
  readonly part: ElaboratedPart;
  private readonly nets: number[];
  private readonly block: TerminalBlock;
  private gateSource!: TwoTerminalHandles;
  private gateDrain!: TwoTerminalHandles;
  private lastVgs = 0;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.nets = [wiring.pins.d, wiring.pins.g, wiring.pins.s];
    this.block = new TerminalBlock(this.nets);
  }

  /** +1 n-channel, −1 p-channel */
  private sign(): number {
    return this.part.values.type === "p" ? -1 : 1;
  }
  private parameters(): JfetParameters {
    return {
      idss: numberValue(this.part, "idss"),
      pinchOff: this.sign() * numberValue(this.part, "pinch_off"),
      lambda: numberValue(this.part, "lambda"),
    };
  }
  /** n-frame (Vgs, Vds) from terminal voltages */
  private frameVoltages(x: Float64Array): [number, number] {
    const sign = this.sign();
    const vs = voltageAt(x, this.nets[SOURCE]);
    return [sign * (voltageAt(x, this.nets[GATE]) - vs), sign * (voltageAt(x, this.nets[DRAIN]) - vs)];
  }

  declare(p: PatternBuilder): void {
    this.block.declare(p);
    this.gateSource = declareTwoTerminal(p, this.nets[GATE], this.nets[SOURCE], { acOnly: true });
    this.gateDrain = declareTwoTerminal(p, this.nets[GATE], this.nets[DRAIN], { acOnly: true });
  }

  startNewton(x: Float64Array): void {
    this.lastVgs = this.frameVoltages(x)[0];
  }

  /** Linearise at n-frame (vgs, vds): fill the terminal block in real terminal quantities. */
  private linearise(vgs: number, vds: number, x: Float64Array): ReturnType<typeof jfetDrainCurrent> {
    const sign = this.sign();
    const point = jfetDrainCurrent(vgs, vds, this.parameters());
    const b = this.block;
    b.clear();
    const vs = voltageAt(x, this.nets[SOURCE]);
    b.voltage[SOURCE] = vs;
    b.voltage[GATE] = vs + sign * vgs;
    b.voltage[DRAIN] = vs + sign * vds;
    const id = sign * point.id;
    b.current[DRAIN] = id;
    b.current[SOURCE] = -id;
    const j = b.jacobian;
    // row drain: gm·(Vg − Vs) + gds·(Vd − Vs); row source is its negative
    j[DRAIN * 3 + DRAIN] = point.gds;
    j[DRAIN * 3 + GATE] = point.gm;
    j[DRAIN * 3 + SOURCE] = -point.gm - point.gds;
    j[SOURCE * 3 + DRAIN] = -point.gds;
    j[SOURCE * 3 + GATE] = -point.gm;
    j[SOURCE * 3 + SOURCE] = point.gm + point.gds;
    return point;
  }

  stampDc(ctx: DcStampContext): void {
    const [vgs, vds] = this.frameVoltages(ctx.x);
    const maxStep = JFET_GATE_STEP_FRACTION * Math.abs(numberValue(this.part, "pinch_off"));
    const limited = limitStep(vgs, this.lastVgs, maxStep);
    if (limited !== vgs) ctx.markLimited();
    this.lastVgs = limited;
    this.linearise(limited, vds, ctx.x);
    this.block.stampDc(ctx);
  }

  /** stored quantities: the charges of cgs and cgd */
  transientStateCount(): number {
    return 2;
  }
  stampTransient(ctx: TransientStampContext): void {
    this.stampDc(ctx);
    ctx.capacitance(0, this.gateSource, this.nets[GATE], this.nets[SOURCE], numberValue(this.part, "cgs"));
    ctx.capacitance(1, this.gateDrain, this.nets[GATE], this.nets[DRAIN], numberValue(this.part, "cgd"));
  }

  /**
   * Nearest boundary (n frame): cut-off at Vov = 0, drain headroom at Vds = Vov = Vgs − Vp — the contract's
   * "saturation" (out of voltage headroom), with the detail that for a JFET this is the ohmic (triode) region, since
   * a JFET's own "saturation" is the constant-current region it works in — and gate conduction at a forward bias
   * of JFET_GATE_FORWARD_WARNING_V.
   */
  regionMargin(x: Float64Array): RegionMargin {
    const [vgs, vds] = this.frameVoltages(x);
    const vov = vgs - this.parameters().pinchOff;
    const candidates: RegionMargin[] = [
      { margin: vov, reason: "cut-off" },
      { margin: Math.abs(vds) - vov, reason: "saturation", detail: JFET_HEADROOM_DETAIL },
      { margin: JFET_GATE_FORWARD_WARNING_V - Math.max(vgs, vgs - vds), reason: "gate conduction" },
    ];
    return candidates.reduce((a, b) => (b.margin < a.margin ? b : a));
  }

  stampAc(ctx: AcStampContext): void {
    const [vgs, vds] = this.frameVoltages(ctx.x);
    this.linearise(vgs, vds, ctx.x);
    this.block.stampAc(ctx);
    stampTwoTerminal(ctx.addReactance, this.gateSource, numberValue(this.part, "cgs"));
    stampTwoTerminal(ctx.addReactance, this.gateDrain, numberValue(this.part, "cgd"));
  }

  report(op: OperatingPointView) {
    const [vgs, vds] = this.frameVoltages(op.x);
    const point = this.linearise(vgs, vds, op.x);
    const warnings = [];
    const forwardBias = Math.max(vgs, vgs - vds);
    if (forwardBias > JFET_GATE_FORWARD_WARNING_V) {
      warnings.push({
        part: this.part.id,
        message: `${this.part.id}: gate junction forward-biased by ${forwardBias.toFixed(2)} V (more than ${JFET_GATE_FORWARD_WARNING_V} V); the model carries no gate current, so this operating point is not trustworthy — make the gate more negative than the source (n-channel) or check the bias network`,
      });
    }
    return {
      values: { region: point.region, id: this.sign() * point.id, gm: point.gm, gds: point.gds },
      warnings,
    };
  }

  noiseSources(op: OperatingPointView) {
    if (this.part.noiseless) return [];
    const [vgs, vds] = this.frameVoltages(op.x);
    const point = this.linearise(vgs, vds, op.x);
    const fc = numberValue(this.part, "fc");
    const en = this.part.values.en;
    const gm = Math.abs(point.gm);
    // Contract: drain current noise 4kT·(2/3)·gm, or gm²·en² when a gate-referred en (V/√Hz) is given.
    const white = typeof en === "number" ? gm * gm * en * en : 4 * BOLTZMANN_J_PER_K * op.temperature * (2 / 3) * gm;
    const flicker = (f: number) => white * (1 + fc / f);
    const out = [
      { part: this.part.id, label: "channel", plus: this.nets[DRAIN], minus: this.nets[SOURCE], psd: flicker },
    ];
    const igss = numberValue(this.part, "igss");
    if (igss > 0) {
      const gate = shotPsd(igss);
      out.push({
        part: this.part.id,
        label: "gate shot",
        plus: this.nets[GATE],
        minus: this.nets[SOURCE],
        psd: () => gate,
      });
    }
    return out;
  }
}

export const jfetKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new Jfet(part, wiring),
};
