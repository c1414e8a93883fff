/**
 * Reading the bench's wires from the page in Chromium and checking them: each drawn as horizontal and vertical runs
 * from handle to handle, none through a drawn item other than the two it joins (its path sampled with
 * getPointAtLength against every node's box and the boxes of everything drawn in it, in screen coordinates), and no
 * two nets along one line. Used by the bench tests that draw or open a circuit.
 */
import type { Page } from "playwright-core";
import { expect } from "vitest";

export interface WireReport {
  id: string;
  net: string;
  routed: boolean;
  /** what each wire passes through: "<wire> × <node> at x,y" */
  crossings: string[];
  /** distance (px on screen) from each end of the path to the nearest handle centre of the node it joins */
  endGaps: number[];
  /** sampled points in canvas units, rounded, for the overlap check */
  points: string[];
  /** segments that are neither horizontal nor vertical */
  slanted: number;
}

/** Reads every wire from the page and checks it against every node's box (the node and all drawn inside it). */
export async function readWires(page: Page): Promise<WireReport[]> {
  return page.evaluate(() => {
    // each node's own box and the box of everything drawn in it (the designator and value under a part reach
    // outside the symbol): a wire may pass beside a small symbol under which a wide label sits, never through either
    const boxes = [...document.querySelectorAll(".react-flow__node")].flatMap((node) => {
      const id = node.getAttribute("data-id") ?? "";
      return [node, ...node.querySelectorAll("*")]
        .map((e) => e.getBoundingClientRect())
        .filter((r) => r.width > 0 && r.height > 0)
        .map((r) => ({ id, left: r.left, top: r.top, right: r.right, bottom: r.bottom }));
    });
    const handleCentres = (nodeId: string) =>
      [...document.querySelectorAll(`.react-flow__node[data-id="${nodeId}"] .react-flow__handle`)].map((h) => {
        const r = h.getBoundingClientRect();
        return { x: r.left + r.width / 2, y: r.top + r.height / 2 };
      });
    return [...document.querySelectorAll(".react-flow__edge")].map((edge) => {
      const path = edge.querySelector("path.react-flow__edge-path") as SVGPathElement;
      const from = edge.getAttribute("data-from") ?? "";
      const to = edge.getAttribute("data-to") ?? "";
      const matrix = path.getScreenCTM() as DOMMatrix;
      const total = path.getTotalLength();
      const crossings: string[] = [];
      const points = new Set<string>();
      for (let at = 0; at <= total; at += 1) {
        const p = path.getPointAtLength(at);
        points.add(`${Math.round(p.x)},${Math.round(p.y)}`);
        const s = new DOMPoint(p.x, p.y).matrixTransform(matrix);
        for (const b of boxes) {
          if (b.id === from || b.id === to) continue;
          // strictly inside by more than a pixel (a stroke grazing an edge is not through it)
          if (s.x > b.left + 1 && s.x < b.right - 1 && s.y > b.top + 1 && s.y < b.bottom - 1)
            crossings.push(`${edge.getAttribute("data-id")} × ${b.id} at ${Math.round(s.x)},${Math.round(s.y)}`);
        }
      }
      const ends = [path.getPointAtLength(0), path.getPointAtLength(total)].map((p) =>
        new DOMPoint(p.x, p.y).matrixTransform(matrix),
      );
      const endGaps = [
        [ends[0], from],
        [ends[1], to],
      ].map(([p, node]) => {
        const { x, y } = p as DOMPoint;
        return Math.min(...handleCentres(node as string).map((h) => Math.hypot(h.x - x, h.y - y)));
      });
      // the path is "M x y L x y …": consecutive corners share x or y
      const numbers = (path.getAttribute("d") ?? "").match(/-?\d+(\.\d+)?/g)?.map(Number) ?? [];
      let slanted = 0;
      for (let i = 2; i + 1 < numbers.length; i += 2)
        if (numbers[i] !== numbers[i - 2] && numbers[i + 1] !== numbers[i - 1]) slanted++;
      return {
        id: edge.getAttribute("data-id") ?? "",
        net: (edge.getAttribute("aria-label") ?? "").replace(/^wire on net /, ""),
        routed: path.getAttribute("data-routed") === "yes",
        crossings: [...new Set(crossings.map((c) => c.replace(/ at .*/, "")))].slice(0, 5),
        endGaps,
        points: [...points],
        slanted,
      };
    });
  });
}

/** Pairs of wires on different nets that share more than a crossing's worth of points (they run along each other). */
function sharedRuns(wires: WireReport[]): string[] {
  const found: string[] = [];
  for (let i = 0; i < wires.length; i++)
    for (let j = i + 1; j < wires.length; j++) {
      if (wires[i].net === wires[j].net) continue;
      const mine = new Set(wires[i].points);
      const shared = wires[j].points.filter((p) => mine.has(p)).length;
      // a crossing shares about one point; running together shares one per unit of length
      if (shared > 4) found.push(`${wires[i].id} (${wires[i].net}) and ${wires[j].id} (${wires[j].net}): ${shared}`);
    }
  return found;
}

export function expectClean(wires: WireReport[]) {
  expect(wires.length).toBeGreaterThan(5);
  for (const wire of wires) {
    expect(wire.routed, `${wire.id} found no clear way`).toBe(true);
    expect(wire.crossings, wire.id).toEqual([]);
    expect(wire.slanted, `${wire.id} has a slanted segment`).toBe(0);
    // each end sits on a handle of the node it joins (the route's geometry is the drawing's)
    for (const gap of wire.endGaps) expect(gap, wire.id).toBeLessThan(1.5);
  }
  expect(sharedRuns(wires)).toEqual([]);
}
