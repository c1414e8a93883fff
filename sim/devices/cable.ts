/**
 * Cable (contract): `segments` pi-sections between a and b, each a series resistance
 * resistance_per_m·length/segments and a capacitance capacitance_per_m·length/(2·segments) from each end to `ref`.
 * Every section's resistance is a branch (series-branch.ts), so resistance_per_m = 0 is an ideal 0 V connection,
 * never 1/0. Internal section joints are extra node unknowns; the two half-capacitances meeting at a joint are
 * stamped as one.
 */
import type { ElaboratedPart } from "../circuit/types";
import type { PatternBuilder } from "../mna/pattern";
import {
  type AcStampContext,
  type DcStampContext,
  type Device,
  type DeviceKind,
  type DeviceWiring,
  type ExtraUnknown,
  numberValue,
  type OperatingPointView,
  type TransientStampContext,
} from "./device";
import { SeriesBranch } from "./series-branch";
import { declareTwoTerminal, stampTwoTerminal, type TwoTerminalHandles } from "./stamps";

function segmentCount(part: ElaboratedPart): number {
  return Math.max(1, Math.round(numberValue(part, "segments")));
}

class Cable implements Device {
  readonly part: ElaboratedPart;
  private readonly joints: number[];
  private readonly ref: number;
  private readonly sections: SeriesBranch[] = [];
  private shunts: TwoTerminalHandles[] = [];

  constructor(part: ElaboratedPart, wiring: DeviceWiring) {
    this.part = part;
    const n = segmentCount(part);
    this.joints = [wiring.pins.a, ...wiring.extra.slice(0, n - 1), wiring.pins.b];
    this.ref = wiring.pins.ref;
    for (let s = 0; s < n; s++) {
      this.sections.push(new SeriesBranch(this.joints[s], this.joints[s + 1], wiring.extra[n - 1 + s]));
    }
  }
  private sectionResistance(): number {
    return (numberValue(this.part, "resistance_per_m") * numberValue(this.part, "length")) / this.sections.length;
  }
  private sectionCapacitance(): number {
    return (numberValue(this.part, "capacitance_per_m") * numberValue(this.part, "length")) / this.sections.length;
  }
  declare(p: PatternBuilder): void {
    for (const s of this.sections) s.declare(p);
    this.shunts = this.joints.map((j) => declareTwoTerminal(p, j, this.ref, { acOnly: true }));
  }
  startNewton(): void {}
  stampDc(ctx: DcStampContext): void {
    const r = this.sectionResistance();
    for (const s of this.sections) s.stampDc(ctx, r);
  }
  stampAc(ctx: AcStampContext): void {
    const r = this.sectionResistance();
    for (const s of this.sections) s.stampAc(ctx, r, 0);
    const c = this.sectionCapacitance();
    const last = this.joints.length - 1;
    this.shunts.forEach((h, j) => {
      stampTwoTerminal(ctx.addReactance, h, j === 0 || j === last ? c / 2 : c);
    });
  }
  /** one charge per joint (the shunt capacitances); the sections carry no inductance */
  transientStateCount(): number {
    return this.joints.length;
  }
  stampTransient(ctx: TransientStampContext): void {
    this.stampDc(ctx);
    const c = this.sectionCapacitance();
    const last = this.joints.length - 1;
    this.shunts.forEach((h, j) => {
      ctx.capacitance(j, h, this.joints[j], this.ref, j === 0 || j === last ? c / 2 : c);
    });
  }
  report() {
    return null;
  }
  noiseSources(op: OperatingPointView) {
    if (this.part.noiseless) return [];
    const r = this.sectionResistance();
    return this.sections.flatMap((s) => s.thermalNoise(this.part.id, op.temperature, r));
  }
}

export const cableKind: DeviceKind = {
  extraUnknowns(part) {
    const n = segmentCount(part);
    const out: ExtraUnknown[] = [];
    for (let j = 1; j < n; j++) out.push({ label: `section joint ${j}`, kind: "voltage" });
    for (let s = 1; s <= n; s++) out.push({ label: `section ${s} current`, kind: "current" });
    return out;
  },
  create: (part, wiring) => new Cable(part, wiring),
};
