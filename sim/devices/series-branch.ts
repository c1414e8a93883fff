/**
 * A series R + L element carried by a branch current I from net a to net b:
 *   V(a) − V(b) − (R + jωL)·I = 0,  KCL +I at a, −I at b.
 * With R = 0 and L = 0 it is an ideal 0 V connection; no 1/R appears anywhere, so zero resistances are safe.
 * Used by the inductor, each cable section and the transformer's primary.
 */
import type { PatternBuilder } from "../mna/pattern";
import type { AcStampContext, DcStampContext, NoiseGenerator, TransientStampContext } from "./device";
import { thermalVoltagePsd } from "./physics";
import { type BranchHandles, declareBranch, stampBranchIncidence } from "./stamps";

export class SeriesBranch {
  private readonly a: number;
  private readonly b: number;
  readonly branch: number;
  private incidence!: BranchHandles;
  private self!: number;

  constructor(a: number, b: number, branch: number) {
    this.a = a;
    this.b = b;
    this.branch = branch;
  }

  declare(p: PatternBuilder): void {
    this.incidence = declareBranch(p, this.a, this.b, this.branch);
    // The series resistance may be 0 Ω: a weak entry, so pivot selection never counts on it.
    this.self = p.entry(this.branch, this.branch, { weak: true });
  }

  stampDc(ctx: DcStampContext, resistance: number): void {
    stampBranchIncidence(ctx.add, this.incidence);
    ctx.add(this.self, -resistance);
  }

  stampAc(ctx: AcStampContext, resistance: number, inductance: number): void {
    stampBranchIncidence(ctx.addConductance, this.incidence);
    ctx.addConductance(this.self, -resistance);
    ctx.addReactance(this.self, -inductance);
  }

  /** transient: the DC stamp plus the flux L·I as stored quantity `state` (skipped for L = 0) */
  stampTransient(ctx: TransientStampContext, state: number, resistance: number, inductance: number): void {
    this.stampDc(ctx, resistance);
    if (inductance > 0) ctx.inductance(state, this.self, this.branch, inductance);
  }

  /** thermal noise of the series resistance as a voltage generator in the branch row */
  thermalNoise(part: string, temperatureK: number, resistance: number): NoiseGenerator[] {
    if (!(resistance > 0)) return [];
    const psd = thermalVoltagePsd(temperatureK, resistance);
    return [{ part, label: "thermal", plus: this.branch, minus: -1, psd: () => psd }];
  }
}
