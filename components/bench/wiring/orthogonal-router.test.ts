import { describe, expect, it } from "vitest";
import {
  DEFAULT_ROUTE_OPTIONS,
  type Obstacle,
  type Point,
  type RoutedWire,
  routeWires,
  type Side,
  type WireRequest,
} from "./orthogonal-router";

const G = DEFAULT_ROUTE_OPTIONS.grid;
const C = DEFAULT_ROUTE_OPTIONS.clearance;

const box = (id: string, x: number, y: number, width: number, height: number): Obstacle => ({
  id,
  x,
  y,
  width,
  height,
});
const end = (x: number, y: number, side: Side, owner: string) => ({ point: { x, y }, side, owner });

/** Does the axis-parallel segment a–b enter the inside of `o` grown by `grow`? (plain interval overlap) */
function segmentHits(a: Point, b: Point, o: Obstacle, grow: number): boolean {
  const [x0, x1] = [Math.min(a.x, b.x), Math.max(a.x, b.x)];
  const [y0, y1] = [Math.min(a.y, b.y), Math.max(a.y, b.y)];
  return x1 > o.x - grow && x0 < o.x + o.width + grow && y1 > o.y - grow && y0 < o.y + o.height + grow;
}

const segments = (r: RoutedWire) => r.points.slice(1).map((b, i) => [r.points[i], b] as const);
const isOrthogonal = (r: RoutedWire) => segments(r).every(([a, b]) => a.x === b.x || a.y === b.y);
const length = (r: RoutedWire) => segments(r).reduce((s, [a, b]) => s + Math.abs(a.x - b.x) + Math.abs(a.y - b.y), 0);
const direction = (a: Point, b: Point): Side =>
  b.x > a.x ? "right" : b.x < a.x ? "left" : b.y > a.y ? "bottom" : "top";
const against: Record<Side, Side> = { left: "right", right: "left", top: "bottom", bottom: "top" };

/**
 * The shortest clear path between two grid points, by Lee's maze algorithm (breadth-first search on the grid, as in
 * C. Y. Lee, "An algorithm for path connections", 1961), written here independently of the router: a point is free
 * when it is outside every box grown by the clearance. Returns its length in canvas units.
 */
function leeLength(
  from: Point,
  to: Point,
  boxes: Obstacle[],
  span: { x0: number; y0: number; x1: number; y1: number },
) {
  const free = (p: Point) =>
    !boxes.some((o) => p.x > o.x - C && p.x < o.x + o.width + C && p.y > o.y - C && p.y < o.y + o.height + C);
  const key = (p: Point) => `${p.x},${p.y}`;
  const seen = new Map([[key(from), 0]]);
  let frontier = [from];
  while (frontier.length > 0) {
    const next: Point[] = [];
    for (const p of frontier) {
      const d = seen.get(key(p)) as number;
      if (p.x === to.x && p.y === to.y) return d * G;
      for (const [dx, dy] of [
        [G, 0],
        [-G, 0],
        [0, G],
        [0, -G],
      ]) {
        const q = { x: p.x + dx, y: p.y + dy };
        if (q.x < span.x0 || q.x > span.x1 || q.y < span.y0 || q.y > span.y1) continue;
        if (seen.has(key(q)) || !free(q)) continue;
        seen.set(key(q), d + 1);
        next.push(q);
      }
    }
    frontier = next;
  }
  return Number.POSITIVE_INFINITY;
}

describe("orthogonal wire router", () => {
  it("joins two facing pins with nothing between by one straight segment", () => {
    const boxes = [box("A", 0, 0, 120, 40), box("B", 300, 0, 120, 40)];
    const wire: WireRequest = { id: "w", net: "n", from: end(120, 20, "right", "A"), to: end(300, 20, "left", "B") };
    const route = routeWires(boxes, [wire]).get("w") as RoutedWire;
    expect(route.routed).toBe(true);
    // the shortest way between two points on one horizontal line is that line (geometry, common practice)
    expect(route.points).toEqual([
      { x: 120, y: 20 },
      { x: 300, y: 20 },
    ]);
  });

  it("never passes through a pin that no wire reaches yet", () => {
    // A's right pin to B's top pin: the shortest way runs right along y = 20, then down; a free pin on that line
    // (given alone here, as the bench gives the pins of its items) must be stepped round
    const boxes = [box("A", 0, 0, 120, 40), box("B", 300, 100, 120, 40)];
    const wire: WireRequest = { id: "w", net: "n", from: end(120, 20, "right", "A"), to: end(360, 100, "top", "B") };
    const onLine = (route: RoutedWire, p: { x: number; y: number }) =>
      segments(route).some(
        ([a, b]) =>
          p.x >= Math.min(a.x, b.x) &&
          p.x <= Math.max(a.x, b.x) &&
          p.y >= Math.min(a.y, b.y) &&
          p.y <= Math.max(a.y, b.y),
      );
    const pin = { x: 240, y: 20 };
    expect(onLine(routeWires(boxes, [wire]).get("w") as RoutedWire, pin)).toBe(true);
    const route = routeWires(boxes, [wire], undefined, [pin]).get("w") as RoutedWire;
    expect(route.routed).toBe(true);
    expect(isOrthogonal(route)).toBe(true);
    expect(onLine(route, pin)).toBe(false);
  });

  it("goes round a box in the way, keeping the clearance, and is as short as the shortest clear path", () => {
    const blocker = box("X", 180, -60, 60, 160);
    const boxes = [box("A", 0, 0, 120, 40), blocker, box("B", 300, 0, 120, 40)];
    const wire: WireRequest = { id: "w", net: "n", from: end(120, 20, "right", "A"), to: end(300, 20, "left", "B") };
    const route = routeWires(boxes, [wire]).get("w") as RoutedWire;
    expect(route.routed).toBe(true);
    expect(isOrthogonal(route)).toBe(true);
    for (const [a, b] of segments(route)) expect(segmentHits(a, b, blocker, C)).toBe(false);
    // every corner on the snap grid
    for (const p of route.points) expect([Math.abs(p.x % G), Math.abs(p.y % G)]).toEqual([0, 0]);
    // from the first grid point out of A's pin to the last before B's: Lee's shortest clear path (the detour over or
    // under the blocker has the same four bends either way, so the bend cost cannot buy a longer one)
    const lee = leeLength({ x: 140, y: 20 }, { x: 280, y: 20 }, boxes, { x0: -100, y0: -200, x1: 500, y1: 300 });
    expect(length(route)).toBe(lee + 2 * G);
  });

  it("leaves each pin in the direction the pin faces, even when the other pin lies behind it", () => {
    // A's pin faces right but B is to the left, below: the wire must first go right, then come round
    const boxes = [box("A", 200, 0, 120, 40), box("B", 0, 200, 80, 100)];
    const wire: WireRequest = { id: "w", net: "n", from: end(320, 20, "right", "A"), to: end(40, 200, "top", "B") };
    const route = routeWires(boxes, [wire]).get("w") as RoutedWire;
    expect(route.routed).toBe(true);
    const [p0, p1] = route.points;
    expect(direction(p0, p1)).toBe("right");
    const n = route.points.length;
    // it arrives at B's top pin going down, i.e. against the side the pin faces
    expect(direction(route.points[n - 2], route.points[n - 1])).toBe(against.top);
    for (const o of boxes)
      for (const [a, b] of segments(route).slice(1, -1)) expect(segmentHits(a, b, o, C), `${o.id}`).toBe(false);
  });

  it("keeps two nets' wires off each other's lines when there is room", () => {
    // two wires whose straightest routes would share the channel between the rows
    const boxes = [
      box("A", 0, 0, 120, 40),
      box("B", 0, 200, 120, 40),
      box("C", 400, 0, 120, 40),
      box("D", 400, 200, 120, 40),
    ];
    const wires: WireRequest[] = [
      { id: "w1", net: "one", from: end(120, 20, "right", "A"), to: end(400, 220, "left", "D") },
      { id: "w2", net: "two", from: end(120, 220, "right", "B"), to: end(400, 20, "left", "C") },
    ];
    const routes = routeWires(boxes, wires);
    const [r1, r2] = [routes.get("w1") as RoutedWire, routes.get("w2") as RoutedWire];
    expect(r1.routed && r2.routed).toBe(true);
    // no stretch of one lies along a stretch of the other (they may cross at a point)
    for (const [a, b] of segments(r1))
      for (const [c, d] of segments(r2)) {
        const sameVertical = a.x === b.x && c.x === d.x && a.x === c.x;
        const sameHorizontal = a.y === b.y && c.y === d.y && a.y === c.y;
        const lo = (u: number, v: number) => Math.min(u, v);
        const hi = (u: number, v: number) => Math.max(u, v);
        if (sameVertical) expect(hi(a.y, b.y) <= lo(c.y, d.y) || hi(c.y, d.y) <= lo(a.y, b.y)).toBe(true);
        if (sameHorizontal) expect(hi(a.x, b.x) <= lo(c.x, d.x) || hi(c.x, d.x) <= lo(a.x, b.x)).toBe(true);
      }
  });

  it("squeezes past along an edge, rather than falling back, where two items stand one grid apart", () => {
    // B's top pin faces A's underside one grid below it: the only way out runs along A's edge
    const a = box("A", 0, 0, 240, 40);
    const boxes = [a, box("B", 160, 60, 80, 100), box("C", -200, 200, 120, 40)];
    const wire: WireRequest = { id: "w", net: "n", from: end(200, 60, "top", "B"), to: end(-80, 220, "right", "C") };
    const route = routeWires(boxes, [wire]).get("w") as RoutedWire;
    expect(route.routed).toBe(true);
    expect(isOrthogonal(route)).toBe(true);
    // never inside A (touching its edge is allowed), nor inside the other items past the pins' own stubs
    for (const [p, q] of segments(route)) expect(segmentHits(p, q, a, 0)).toBe(false);
    expect(direction(route.points[0], route.points[1])).toBe("top");
  });

  it("falls back to a stepped path when the pin faces straight into another item", () => {
    // B sits hard against A's right pin: there is no way out of it to the right
    const boxes = [box("A", 0, 0, 120, 40), box("B", 125, -20, 40, 80), box("C", 300, 200, 120, 40)];
    const wire: WireRequest = { id: "w", net: "n", from: end(120, 20, "right", "A"), to: end(300, 220, "left", "C") };
    const route = routeWires(boxes, [wire]).get("w") as RoutedWire;
    expect(route.routed).toBe(false);
    expect(isOrthogonal(route)).toBe(true);
    expect(route.points[0]).toEqual({ x: 120, y: 20 });
    expect(route.points.at(-1)).toEqual({ x: 300, y: 220 });
    expect(direction(route.points[0], route.points[1])).toBe("right");
  });

  it("falls back when the other pin is walled in", () => {
    const wall = [box("N", 260, 80, 200, 40), box("S", 260, 320, 200, 40), box("E", 420, 80, 40, 280)];
    const west = box("W", 260, 80, 40, 280);
    const boxes = [box("A", 0, 0, 120, 40), ...wall, west, box("T", 340, 200, 40, 40)];
    const wire: WireRequest = { id: "w", net: "n", from: end(120, 20, "right", "A"), to: end(360, 200, "top", "T") };
    const route = routeWires(boxes, [wire]).get("w") as RoutedWire;
    expect(route.routed).toBe(false);
    expect(route.points.at(-1)).toEqual({ x: 360, y: 200 });
  });

  it("gives the same routes for the same drawing", () => {
    const boxes = [box("A", 0, 0, 120, 40), box("X", 180, -60, 60, 160), box("B", 300, 0, 120, 40)];
    const wires: WireRequest[] = [
      { id: "w1", net: "n", from: end(120, 20, "right", "A"), to: end(300, 20, "left", "B") },
      { id: "w2", net: "m", from: end(0, 20, "left", "A"), to: end(420, 20, "right", "B") },
    ];
    expect([...routeWires(boxes, wires)]).toEqual([...routeWires(boxes, wires)]);
  });
});
