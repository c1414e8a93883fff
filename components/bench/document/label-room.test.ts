/**
 * A part's designator and value never lie over a neighbour: checked with the plain axis-aligned rectangle test (two
 * boxes are apart when one lies wholly left, right, above or below the other — common practice), written out here
 * independently of label-room.ts, on worked layouts and on random ones (fast-check).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { PartKind } from "@/sim/circuit/types";
import { labelLeft } from "../symbols/label-place";
import { rotatedSize } from "../symbols/pin-layout";
import { partLabelRect, type Rect } from "./free-spot";
import { drawnLabelRect, LABEL_ROOM_GAP, type LabelledPart, labelWidths } from "./label-room";
import { GRID } from "./layout";
import { newPart } from "./part-defaults";

const labelled = (kind: PartKind, id: string, x: number, y: number, keyText: string): LabelledPart => ({
  part: newPart(kind, id),
  placement: { x, y, rotation: 0 },
  keyText,
});

const symbolBox = ({ part, placement }: LabelledPart): Rect => ({
  x: placement.x,
  y: placement.y,
  ...rotatedSize(part.kind, placement.rotation),
});

const apart = (a: Rect, b: Rect) =>
  a.x + a.width <= b.x || b.x + b.width <= a.x || a.y + a.height <= b.y || b.y + b.height <= a.y;

/**
 * What label-room.ts documents as a label's narrowest: its designator line, and at least the symbol's width under
 * the text (all of it when centred, right of the downward pin otherwise), never wider than the text needs.
 */
function narrowestLabel(p: LabelledPart): Rect {
  const natural = partLabelRect(p.part, p.placement, p.keyText);
  const size = rotatedSize(p.part.kind, p.placement.rotation);
  const left = labelLeft(p.part.kind, p.placement.rotation);
  const under = left === null ? size.width : Math.max(0, size.width - left);
  const designator = partLabelRect(p.part, p.placement, "").width;
  return drawnLabelRect(p, Math.min(natural.width, Math.max(under, designator)));
}

const LONG = "50 pF · electret 100 V · bias 1 GΩ";

describe("room for a part's label", () => {
  it("leaves a label that fits as it is", () => {
    const parts = [labelled("capsule", "MIC1", 0, 0, "50 pF"), labelled("load", "IN1", 400, 0, "2.2 kΩ")];
    expect(labelWidths(parts, parts.map(symbolBox)).size).toBe(0);
  });

  it("cuts a label beside a downward pin back to the gap before the next part's downward wire", () => {
    // capsule and load are 80 wide with their bottom pin at 40 and the text from 48 (label-place.ts); the load's
    // wire leaves its pin at 160 + 40 = 200 and runs down through the text band (drawn 2 wide: 199…201)
    const parts = [labelled("capsule", "MIC1", 0, 0, LONG), labelled("load", "IN1", 160, 0, "2.2 kΩ")];
    const widths = labelWidths(parts, parts.map(symbolBox));
    expect(widths.get("MIC1")).toBe(199 - LABEL_ROOM_GAP - 48);
    expect(widths.has("IN1")).toBe(false);
  });

  it("cuts a centred label alike on both sides, up to the neighbour's narrowest label", () => {
    // resistors 120 wide, labels centred, both texts long: R2's label, at its narrowest, is its symbol's width
    // (x 140…260), so R1's, centred on 60, may reach 140 − gap; R2's then starts a gap after R1's
    const parts = [labelled("resistor", "R1", 0, 0, LONG), labelled("resistor", "R2", 140, 0, LONG)];
    const widths = labelWidths(parts, parts.map(symbolBox));
    expect(widths.get("R1")).toBe(2 * (140 - LABEL_ROOM_GAP - 60));
    expect(widths.get("R2")).toBe(120);
    const [r1, r2] = parts.map((p) => drawnLabelRect(p, widths.get(p.part.id) ?? null));
    expect(r1.x + r1.width / 2).toBeCloseTo(60, 9);
    expect(r2.x - (r1.x + r1.width)).toBeCloseTo(LABEL_ROOM_GAP, 9);
  });

  it("lets a long label reach under a neighbour's symbol where that part's own text is short", () => {
    // R2's "1 kΩ" is 4 letters: 4 × 6.6 + 8 = 34.4 wide, centred on 200, so it starts at 182.8
    const parts = [labelled("resistor", "R1", 0, 0, LONG), labelled("resistor", "R2", 140, 0, "1 kΩ")];
    const widths = labelWidths(parts, parts.map(symbolBox));
    expect(widths.get("R1")).toBeCloseTo(2 * (182.8 - LABEL_ROOM_GAP - 60), 9);
  });

  it("never cuts a label below its designator or its symbol's width", () => {
    const parts = [labelled("resistor", "R1", 0, 0, LONG), labelled("resistor", "R2", 120, 0, LONG)];
    const widths = labelWidths(parts, parts.map(symbolBox));
    for (const p of parts) expect(widths.get(p.part.id) ?? 0).toBeGreaterThanOrEqual(120);
  });

  it("on random drawings: a label apart from an item at its narrowest stays apart at its drawn width", () => {
    const kinds: PartKind[] = ["resistor", "capsule", "load", "jfet", "capacitor", "triode"];
    const part = fc.record({
      kind: fc.constantFrom(...kinds),
      col: fc.integer({ min: 0, max: 30 }),
      row: fc.integer({ min: 0, max: 12 }),
      text: fc.string({ minLength: 0, maxLength: 40 }),
    });
    let cutLabels = 0;
    fc.assert(
      fc.property(fc.array(part, { minLength: 1, maxLength: 12 }), (drawn) => {
        const parts = drawn.map((d, i) => labelled(d.kind, `P${i}`, d.col * GRID, d.row * GRID, d.text));
        const boxes = parts.map(symbolBox);
        const widths = labelWidths(parts, boxes);
        cutLabels += widths.size;
        const labels = parts.map((p) => drawnLabelRect(p, widths.get(p.part.id) ?? null));
        const narrowest = parts.map(narrowestLabel);
        for (let i = 0; i < parts.length; i++) {
          const natural = partLabelRect(parts[i].part, parts[i].placement, parts[i].keyText);
          expect(labels[i].width).toBeLessThanOrEqual(natural.width);
          expect(labels[i].width).toBeGreaterThanOrEqual(narrowest[i].width);
          for (let j = 0; j < parts.length; j++) {
            if (i === j) continue;
            if (apart(narrowest[i], boxes[j]))
              expect(apart(labels[i], boxes[j]), `P${i} over P${j}'s symbol`).toBe(true);
            if (j > i && apart(narrowest[i], narrowest[j]))
              expect(apart(labels[i], labels[j]), `P${i} and P${j}'s labels`).toBe(true);
          }
        }
      }),
      { numRuns: 300, seed: 20261203 },
    );
    // the drawings are crowded enough that many labels are cut: the property was tried where it matters
    expect(cutLabels).toBeGreaterThan(100);
  });
});
