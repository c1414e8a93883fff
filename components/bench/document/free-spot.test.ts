/**
 * New items land on free grid space: checked with the plain axis-aligned rectangle test (two boxes are apart when
 * one lies wholly left, right, above or below the other — common practice), written out here independently of
 * free-spot.ts's own `overlaps`.
 */
import { describe, expect, it } from "vitest";
import { PART_KINDS } from "@/sim/circuit/types";
import { createBenchStore } from "../store/bench-store";
import { CLEARANCE, freeShift, occupied, partFootprint, type Rect } from "./free-spot";
import { newPart } from "./part-defaults";
import { openDocument } from "./document";
import { emptyLayout, GRID } from "./layout";

const emptyDocument = () =>
  openDocument(
    { format: "backplate/circuit", version: 1, parts: [], output: { plus: "0", minus: "0" } },
    emptyLayout(),
  );

/** Boxes apart by at least `gap` on some axis (separating-axis test for axis-aligned boxes). */
const apart = (a: Rect, b: Rect, gap: number) =>
  a.x + a.width + gap <= b.x ||
  b.x + b.width + gap <= a.x ||
  a.y + a.height + gap <= b.y ||
  b.y + b.height + gap <= a.y;

function footprints(store: ReturnType<typeof createBenchStore>): Rect[] {
  const { document } = store.getState();
  return occupied(document.layout, document.circuit.parts, document.circuit.parameters);
}

function expectAllApart(rects: Rect[]) {
  for (let i = 0; i < rects.length; i++)
    for (let j = i + 1; j < rects.length; j++) expect(apart(rects[i], rects[j], CLEARANCE), `${i} and ${j}`).toBe(true);
}

describe("free spot for a new item", () => {
  it("leaves a footprint that is clear where it is", () => {
    expect(freeShift({ x: 100, y: 60, width: 120, height: 80 }, [{ x: 0, y: 0, width: 60, height: 60 }])).toEqual({
      dx: 0,
      dy: 0,
    });
  });

  it("moves a footprint off an occupied place by the fewest grid steps", () => {
    const taken: Rect[] = [{ x: 0, y: 0, width: 120, height: 80 }];
    const shift = freeShift({ x: 0, y: 0, width: 120, height: 80 }, taken);
    expect(apart({ x: shift.dx, y: shift.dy, width: 120, height: 80 }, taken[0], CLEARANCE)).toBe(true);
    // nearest: down by the box's height and the clearance (100) beats right by 140
    expect(shift).toEqual({ dx: 0, dy: 100 });
    expect(shift.dy % GRID).toBe(0);
  });

  it("keeps every part kind dropped on one point apart from the others (the store's addPart)", () => {
    const store = createBenchStore(emptyDocument());
    for (const kind of PART_KINDS) store.getState().addPart(kind, { x: 200, y: 200 });
    store.getState().addGround({ x: 200, y: 200 });
    store.getState().addNetLabel({ x: 200, y: 200 }, "out");
    const rects = footprints(store);
    expect(rects).toHaveLength(PART_KINDS.length + 2);
    expectAllApart(rects);
  });

  it("pastes a copy where it covers nothing, even over a neighbour below-right", () => {
    const store = createBenchStore(emptyDocument());
    const r1 = store.getState().addPart("resistor", { x: 0, y: 0 }) as string;
    store.getState().addPart("capacitor", { x: 40, y: 60 });
    store.getState().select({ parts: [r1] });
    store.getState().copy();
    store.getState().paste();
    store.getState().paste();
    expect(store.getState().document.circuit.parts).toHaveLength(4);
    expectAllApart(footprints(store));
  });

  it("counts the label under a part as taken, also where it is wider than the symbol", () => {
    const jfet = newPart("jfet", "J1");
    const r = partFootprint(jfet, { x: 0, y: 0, rotation: 0 }, {});
    expect(r.height).toBeGreaterThan(100);
    // the JFET's key value (its channel and pinch-off) is longer than its 100-unit symbol is wide
    expect(r.width).toBeGreaterThan(100);
    // the source pin faces down, so the text starts beside its wire and runs on past the symbol's right side
    expect(r.x).toBe(0);
    expect(r.x + r.width).toBeGreaterThan(100);
    const beside = freeShift({ x: 120, y: 0, width: 100, height: 140 }, [r]);
    expect(apart({ x: 120 + beside.dx, y: beside.dy, width: 100, height: 140 }, r, CLEARANCE)).toBe(true);
  });
});
