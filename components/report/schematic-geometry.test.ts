/**
 * The report's circuit picture: every wire ends on a pin of a symbol as drawn (checked by applying the symbol's SVG
 * transform by hand here, the SVG 1.1 transform rules: the rightmost transform applies first), and every label lies
 * inside the picture, for the shipped examples laid out by the bench's automatic layout.
 */
import { describe, expect, it } from "vitest";
import { openDocument } from "@/components/bench/document/document";
import type { Rotation } from "@/components/bench/document/layout";
import { SYMBOL_BOXES } from "@/components/bench/symbols/pin-layout";
import demo from "@/sim/examples/demo-microphone.json";
import valve from "@/sim/examples/valve-transformer.json";
import { schematicGeometry, steppedWire } from "./schematic-geometry";

type Point = { x: number; y: number };

/** Applies "translate(a b) scale(s) rotate(deg) translate(c d)" to a point, rightmost first (SVG 1.1 §7.5). */
function applyTransform(transform: string, p: Point): Point {
  const ops = [...transform.matchAll(/(translate|scale|rotate)\(([^)]*)\)/g)].map((m) => ({ op: m[1], args: m[2].trim().split(/[\s,]+/).map(Number) }));
  let { x, y } = p;
  for (const { op, args } of ops.reverse()) {
    if (op === "translate") [x, y] = [x + args[0], y + (args[1] ?? 0)];
    if (op === "scale") [x, y] = [x * args[0], y * (args[1] ?? args[0])];
    if (op === "rotate") {
      const r = (args[0] * Math.PI) / 180;
      [x, y] = [x * Math.cos(r) - y * Math.sin(r), x * Math.sin(r) + y * Math.cos(r)];
    }
  }
  return { x, y };
}

const wireEnds = (d: string): Point[] => {
  // the stepped wire's first point and its last (the last H or V sets one coordinate of the previous corner)
  const nums = [...d.matchAll(/([MHV])([-\d.e]+)(?: ([-\d.e]+))?/g)];
  const start = { x: Number(nums[0][2]), y: Number(nums[0][3]) };
  let at = { ...start };
  for (const n of nums.slice(1)) at = n[1] === "H" ? { ...at, x: Number(n[2]) } : { ...at, y: Number(n[2]) };
  return [start, at];
};

describe("report circuit picture", () => {
  const turned: Record<string, Rotation> = { RPOL: 90, J1: 270, COUT: 180 };
  for (const [name, file, turn] of [["demo microphone", demo, false], ["demo microphone with parts turned", demo, true], ["valve with transformer", valve, false]] as const) {
    it(`ends every wire of the ${name} on a drawn pin or a ground or net label, and keeps labels inside`, () => {
      const document = openDocument(structuredClone(file));
      if (turn) for (const [id, rotation] of Object.entries(turned)) document.layout.parts[id].rotation = rotation;
      const g = schematicGeometry(document.circuit, document.layout, { width: 515, height: 500 }, document.circuit.parameters);
      if (!g) throw new Error("no picture");
      expect(g.width).toBeLessThanOrEqual(515.5);
      expect(g.height).toBeLessThanOrEqual(500.5);
      const pins: Point[] = [];
      for (const part of g.parts) {
        const kind = document.circuit.parts.find((p) => p.id === part.id)?.kind;
        if (!kind) throw new Error(part.id);
        const box = SYMBOL_BOXES[kind];
        for (const place of Object.values(box.pins)) {
          const local = {
            left: { x: 0, y: box.height * place.at },
            right: { x: box.width, y: box.height * place.at },
            top: { x: box.width * place.at, y: 0 },
            bottom: { x: box.width * place.at, y: box.height },
          }[place.side];
          pins.push(applyTransform(part.transform, local));
        }
        for (const text of [part.name, part.value]) {
          if (!text) continue;
          expect(text.x).toBeGreaterThan(0);
          expect(text.y).toBeGreaterThan(0);
          expect(text.y).toBeLessThan(g.height);
        }
        expect(part.plate.x).toBeGreaterThanOrEqual(0);
        expect(part.plate.x + part.plate.width).toBeLessThanOrEqual(g.width);
        expect(part.plate.y + part.plate.height).toBeLessThanOrEqual(g.height);
      }
      for (const gr of g.grounds) pins.push(applyTransform(gr.transform, { x: 20, y: 0 }));
      for (const l of g.labels) {
        const [x, y] = l.flag.slice(1).split(/[L ]/).map(Number);
        pins.push({ x, y });
      }
      expect(g.wires.length).toBe(document.layout.wires.length);
      for (const w of g.wires) {
        for (const end of wireEnds(w.d)) {
          const nearest = Math.min(...pins.map((p) => Math.hypot(p.x - end.x, p.y - end.y)));
          expect(nearest).toBeLessThan(0.01);
        }
      }
      // readable: never below 6.5 pt (from memory: the smallest size commonly printed on drawings)
      expect(g.fontSize).toBeGreaterThanOrEqual(6.5);
    });
  }

  it("leaves a side pin sideways and a top pin vertically", () => {
    expect(steppedWire({ x: 0, y: 0, side: "right" }, { x: 10, y: 20 })).toBe("M0 0H5V20H10");
    expect(steppedWire({ x: 0, y: 0, side: "top" }, { x: 10, y: -20 })).toBe("M0 0V-10H10V-20");
  });
});
