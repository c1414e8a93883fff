/**
 * Triode, three-halves power law (contract): Ia = k·(Vak + mu·Vgk)^1.5 when the control voltage
 * u = Vak + mu·Vgk is positive, else 0; no grid current. ga = ∂Ia/∂Vak = 1.5·k·√u (rp = 1/ga), gm = mu·ga, so
 * μ = gm·rp holds exactly. The current depends on u alone, so Newton limiting acts on u: it may grow by at most
 * TRIODE_CONTROL_GROWTH times its previous value plus TRIODE_CONTROL_STEP_V per iteration (a power law overshoots
 * from a cold start with tens of volts on the anode).
 */
import { BOLTZMANN_J_PER_K } from "../constants";
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
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles, voltageAt } from "./stamps";
import { TerminalBlock } from "./terminal-block";

export const TRIODE_CONTROL_STEP_V = 10;
export const TRIODE_CONTROL_GROWTH = 1;

const ANODE = 0;
const GRID = 1;
const CATHODE = 2;

export interface TriodePoint {
  ia: number;
  /** ∂Ia/∂Vak, S */
  ga: number;
  /** ∂Ia/∂Vgk, S */
  gm: number;
}

export function triodeAnodeCurrent(u: number, perveance: number, mu: number): TriodePoint {
  if (u <= 0) return { ia: 0, ga: 0, gm: 0 };
  const root = Math.sqrt(u);
  const ga = 1.5 * perveance * root;
  return { ia: perveance * u * root, ga, gm: mu * ga };
}

class Triode implements Device {
  readonly part: ElaboratedPart;
  private readonly nets: number[];
  private readonly block: TerminalBlock;
  private lastControl = 0;
  private gk!: TwoTerminalHandles;
  private ga!: TwoTerminalHandles;
  private ak!: TwoTerminalHandles;

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    this.nets = [wiring.pins.a, wiring.pins.g, wiring.pins.k];
    this.block = new TerminalBlock(this.nets);
  }
  private control(x: Float64Array): number {
    const vk = voltageAt(x, this.nets[CATHODE]);
    const mu = numberValue(this.part, "mu");
    return voltageAt(x, this.nets[ANODE]) - vk + mu * (voltageAt(x, this.nets[GRID]) - vk);
  }
  declare(p: PatternBuilder): void {
    this.block.declare(p);
    this.gk = declareTwoTerminal(p, this.nets[GRID], this.nets[CATHODE], { acOnly: true });
    this.ga = declareTwoTerminal(p, this.nets[GRID], this.nets[ANODE], { acOnly: true });
    this.ak = declareTwoTerminal(p, this.nets[ANODE], this.nets[CATHODE], { acOnly: true });
  }
  startNewton(x: Float64Array): void {
    this.lastControl = this.control(x);
  }
  /** Companion at control voltage u: Ia ≈ Ia(u) + ga·(Vak − …) + gm·(Vgk − …), expressed on the block. */
  private linearise(u: number, x: Float64Array): TriodePoint {
    const mu = numberValue(this.part, "mu");
    const point = triodeAnodeCurrent(u, numberValue(this.part, "k"), mu);
    const b = this.block;
    b.clear();
    // Any terminal voltages with Vak + mu·Vgk = u are a valid linearisation point: keep the grid and cathode.
    const vk = voltageAt(x, this.nets[CATHODE]);
    const vg = voltageAt(x, this.nets[GRID]);
    b.voltage[CATHODE] = vk;
    b.voltage[GRID] = vg;
    b.voltage[ANODE] = vk + u - mu * (vg - vk);
    b.current[ANODE] = point.ia;
    b.current[CATHODE] = -point.ia;
    const j = b.jacobian;
    j[ANODE * 3 + ANODE] = point.ga;
    j[ANODE * 3 + GRID] = point.gm;
    j[ANODE * 3 + CATHODE] = -point.ga - point.gm;
    j[CATHODE * 3 + ANODE] = -point.ga;
    j[CATHODE * 3 + GRID] = -point.gm;
    j[CATHODE * 3 + CATHODE] = point.ga + point.gm;
    return point;
  }
  stampDc(ctx: DcStampContext): void {
    const proposed = this.control(ctx.x);
    const ceiling = this.lastControl + TRIODE_CONTROL_GROWTH * Math.abs(this.lastControl) + TRIODE_CONTROL_STEP_V;
    const u = Math.min(proposed, ceiling);
    if (u !== proposed) ctx.markLimited();
    this.lastControl = u;
    this.linearise(u, ctx.x);
    this.block.stampDc(ctx);
  }
  /** stored quantities: the charges of cgk, cga and cak */
  transientStateCount(): number {
    return 3;
  }
  stampTransient(ctx: TransientStampContext): void {
    this.stampDc(ctx);
    const [a, g, k] = this.nets;
    ctx.capacitance(0, this.gk, g, k, numberValue(this.part, "cgk"));
    ctx.capacitance(1, this.ga, g, a, numberValue(this.part, "cga"));
    ctx.capacitance(2, this.ak, a, k, numberValue(this.part, "cak"));
  }
  /** Nearest boundary: cut-off at Vak + mu·Vgk = 0 (in grid volts, divided by mu) or grid conduction at Vgk = 0. */
  regionMargin(x: Float64Array): RegionMargin {
    const vgk = voltageAt(x, this.nets[GRID]) - voltageAt(x, this.nets[CATHODE]);
    const cutOff = this.control(x) / Math.max(numberValue(this.part, "mu"), 1);
    return cutOff < -vgk ? { margin: cutOff, reason: "cut-off" } : { margin: -vgk, reason: "grid conduction" };
  }
  stampAc(ctx: AcStampContext): void {
    this.linearise(this.control(ctx.x), ctx.x);
    this.block.stampAc(ctx);
    stampTwoTerminal(ctx.addReactance, this.gk, numberValue(this.part, "cgk"));
    stampTwoTerminal(ctx.addReactance, this.ga, numberValue(this.part, "cga"));
    stampTwoTerminal(ctx.addReactance, this.ak, numberValue(this.part, "cak"));
  }
  report(op: OperatingPointView) {
    const point = this.linearise(this.control(op.x), op.x);
    const conducting = point.ia > 0;
    const warnings = conducting
      ? []
      : [
          {
            part: this.part.id,
            message: `${this.part.id}: valve cut off (Vak + mu·Vgk ≤ 0), no anode current — make the grid less negative or raise the anode supply`,
          },
        ];
    return {
      values: {
        region: conducting ? "conducting" : "cut-off",
        ia: point.ia,
        gm: point.gm,
        rp: conducting ? 1 / point.ga : null,
        mu: numberValue(this.part, "mu"),
      },
      warnings,
    };
  }
  noiseSources(op: OperatingPointView) {
    if (this.part.noiseless) return [];
    const point = this.linearise(this.control(op.x), op.x);
    if (point.gm === 0) return [];
    // Contract: grid-referred equivalent noise resistance req [2.5/gm], thermal: anode current noise gm²·4kT·req.
    const given = this.part.values.req;
    const req = typeof given === "number" ? given : 2.5 / point.gm;
    const psd = point.gm * point.gm * 4 * BOLTZMANN_J_PER_K * op.temperature * req;
    return [{ part: this.part.id, label: "valve", plus: this.nets[ANODE], minus: this.nets[CATHODE], psd: () => psd }];
  }
}

export const triodeKind: DeviceKind = {
  extraUnknowns: () => [],
  create: (part, wiring) => new Triode(part, wiring),
};
