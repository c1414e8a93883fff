/**
 * Wire routing for the bench drawing: each wire becomes a path of horizontal and vertical segments from pin to pin
 * that keeps clear of every drawn item's box, runs on the snap grid, leaves each pin in the direction the pin faces,
 * and prefers few bends and a short length. Pure TypeScript (no React, no DOM), so it is tested on its own.
 *
 * Method: A* over the grid points that span the drawing (multiples of the grid, plus the pins' own coordinates),
 * with the direction of travel in the state so a bend can cost extra. Wires are routed one after another; a grid
 * edge already used by another net's wire costs extra, so two nets are not drawn on top of each other where a free
 * line exists. A wire that finds no way (its pin faces straight into another item, or it is walled in) gets a
 * stepped path and `routed: false`.
 */
import { MinHeap } from "./min-heap";

export type Side = "left" | "right" | "top" | "bottom";

export interface Point {
  x: number;
  y: number;
}

/** A drawn item's box (canvas units); wires keep out of it, except to reach their own pins. One item may have several. */
export interface Obstacle {
  id: string;
  x: number;
  y: number;
  width: number;
  height: number;
}

/** One end of a wire: the pin's point, the side of its item it faces, and the item it belongs to. */
export interface WireEnd {
  point: Point;
  side: Side;
  owner: string;
}

export interface WireRequest {
  id: string;
  /** wires of one net may share a line (they are one conductor); different nets may not */
  net: string;
  from: WireEnd;
  to: WireEnd;
}

export interface RoutedWire {
  /** corners from the first pin to the second, collinear points removed */
  points: Point[];
  /** false when no clear way was found and the stepped fallback was drawn */
  routed: boolean;
}

export interface RouteOptions {
  /** grid spacing the wires run on */
  grid: number;
  /** how close (canvas units) a wire may pass an item's box; less than the grid so a 2-grid gap takes a wire */
  clearance: number;
  /** extra cost of one bend, in canvas units of length */
  bendCost: number;
}

export const DEFAULT_ROUTE_OPTIONS: RouteOptions = { grid: 20, clearance: 8, bendCost: 40 };

/** Extra cost per unit length of running along another net's wire (drawn on top of it: avoid hard). */
const SHARED_LINE_COST = 6;
/**
 * Share of the length paid for running along a wire of the same net: one conductor drawn once reads better than
 * two parallel lines a grid apart. (It makes the A* estimate a little optimistic-to-pessimistic; the route is then
 * near-cheapest rather than cheapest, which a drawing does not notice.)
 */
const SAME_NET_SHARE = 0.4;
/** Extra cost of crossing another net's wire (a crossing reads fine, but fewer is cleaner). */
const CROSSING_COST = 12;
/** Extra cost of passing through another net's pin stub end (it would look joined to that pin). */
const FOREIGN_PIN_COST = 400;
/**
 * Extra cost per unit length within an item's clearance: a route keeps its distance where it can, and squeezes past
 * (rather than giving up) where two items stand a grid apart. Never inside an item: every box is at least 24 units
 * each way, more than a grid step, so a step between two points outside a box cannot cross it.
 */
const CLEARANCE_COST = 3;
const SOFT = 1;
const HARD = 2;
/** Margin (grid steps) around the drawing the routes may use to go round everything. */
const MARGIN_STEPS = 3;

// directions: 0 right, 1 down, 2 left, 3 up
const DX = [1, 0, -1, 0];
const DY = [0, 1, 0, -1];
const OUTWARD: Record<Side, number> = { right: 0, bottom: 1, left: 2, top: 3 };
const opposite = (d: number) => (d + 2) % 4;

interface Grid {
  xs: number[];
  ys: number[];
  /** index of each x / y value */
  xAt: Map<number, number>;
  yAt: Map<number, number>;
  /** SOFT where a point lies within an obstacle's clearance, HARD where strictly inside the obstacle, else 0 */
  blocked: Uint8Array;
}

function spanning(values: number[], step: number, extras: number[]): number[] {
  const lo = Math.floor(Math.min(...values) / step - MARGIN_STEPS) * step;
  const hi = Math.ceil(Math.max(...values) / step + MARGIN_STEPS) * step;
  const set = new Set<number>(extras);
  for (let v = lo; v <= hi; v += step) set.add(v);
  return [...set].sort((a, b) => a - b);
}

function inside(o: Obstacle, x: number, y: number, clearance: number): boolean {
  return x > o.x - clearance && x < o.x + o.width + clearance && y > o.y - clearance && y < o.y + o.height + clearance;
}

/** The grid points, and which of them lie inside an item. */
function buildGrid(
  obstacles: readonly Obstacle[],
  wires: readonly WireRequest[],
  options: RouteOptions,
  freePins: readonly Point[],
): Grid {
  const ends = wires.flatMap((w) => [w.from.point, w.to.point]);
  const allX = [...obstacles.flatMap((o) => [o.x, o.x + o.width]), ...ends.map((p) => p.x)];
  const allY = [...obstacles.flatMap((o) => [o.y, o.y + o.height]), ...ends.map((p) => p.y)];
  const xs = spanning(
    allX,
    options.grid,
    ends.map((p) => p.x),
  );
  const ys = spanning(
    allY,
    options.grid,
    ends.map((p) => p.y),
  );
  const blocked = new Uint8Array(xs.length * ys.length);
  // the clearance rings first, then the insides over them
  for (const o of obstacles) mark(blocked, xs, ys, o, options.clearance, SOFT);
  for (const o of obstacles) mark(blocked, xs, ys, o, 0, HARD);
  // a pin is passed by no other wire (it would read as joined to it); a wire's own pins are its ends, never passed
  const xAt = new Map(xs.map((x, i) => [x, i]));
  const yAt = new Map(ys.map((y, i) => [y, i]));
  for (const p of ends) blocked[(yAt.get(p.y) as number) * xs.length + (xAt.get(p.x) as number)] = HARD;
  // so is a pin no wire reaches yet (it sits on the grid, as every pin does; one off it no route can touch)
  for (const p of freePins) {
    const ix = xAt.get(p.x);
    const iy = yAt.get(p.y);
    if (ix !== undefined && iy !== undefined) blocked[iy * xs.length + ix] = HARD;
  }
  return {
    xs,
    ys,
    xAt,
    yAt,
    blocked,
  };
}

/** Sets `value` at the points strictly inside `o` grown by `grow`. */
function mark(blocked: Uint8Array, xs: number[], ys: number[], o: Obstacle, grow: number, value: number) {
  const x0 = lowerBound(xs, o.x - grow, true);
  const x1 = lowerBound(xs, o.x + o.width + grow, false);
  const y0 = lowerBound(ys, o.y - grow, true);
  const y1 = lowerBound(ys, o.y + o.height + grow, false);
  for (let iy = y0; iy < y1; iy++) blocked.fill(value, iy * xs.length + x0, iy * xs.length + x1);
}

/** First index whose value is > v (strict) or >= v (not strict). */
function lowerBound(values: number[], v: number, strict: boolean): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (strict ? values[mid] <= v : values[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * From a pin, the points walked in the pin's direction up to the first one clear of its own item by the clearance;
 * null when that walk enters another item first (the pin faces straight into it). The last point may lie within
 * another item's clearance (two items a grid apart): the search may start or end there, never pass through.
 */
function walkOut(grid: Grid, end: WireEnd, obstacles: readonly Obstacle[], clearance: number): number[] | null {
  const nx = grid.xs.length;
  let ix = grid.xAt.get(end.point.x) as number;
  let iy = grid.yAt.get(end.point.y) as number;
  const d = OUTWARD[end.side];
  const own = obstacles.filter((o) => o.id === end.owner);
  const walked = [iy * nx + ix];
  for (;;) {
    ix += DX[d];
    iy += DY[d];
    if (ix < 0 || iy < 0 || ix >= nx || iy >= grid.ys.length) return null;
    const index = iy * nx + ix;
    walked.push(index);
    const x = grid.xs[ix];
    const y = grid.ys[iy];
    if (obstacles.some((o) => o.id !== end.owner && inside(o, x, y, 0))) return null;
    if (!own.some((o) => inside(o, x, y, clearance))) return walked;
  }
}

/**
 * Two pins that face each other on one line with nothing but their own items between (a ground symbol right under
 * its part's pin): the straight line joins them.
 */
function facing(from: WireEnd, to: WireEnd, obstacles: readonly Obstacle[]): boolean {
  const d = OUTWARD[from.side];
  if (OUTWARD[to.side] !== opposite(d)) return false;
  const dx = to.point.x - from.point.x;
  const dy = to.point.y - from.point.y;
  const ahead = DX[d] !== 0 ? dy === 0 && Math.sign(dx) === DX[d] : dx === 0 && Math.sign(dy) === DY[d];
  if (!ahead) return false;
  const x0 = Math.min(from.point.x, to.point.x);
  const x1 = Math.max(from.point.x, to.point.x);
  const y0 = Math.min(from.point.y, to.point.y);
  const y1 = Math.max(from.point.y, to.point.y);
  return !obstacles.some(
    (o) =>
      o.id !== from.owner && o.id !== to.owner && x1 >= o.x && x0 <= o.x + o.width && y1 >= o.y && y0 <= o.y + o.height,
  );
}

/** Which net uses each grid edge and point so far (0: none; -1: more than one). */
class Occupancy {
  readonly edges: Int32Array;
  readonly points: Int32Array;
  readonly pinEnds: Int32Array;
  constructor(size: number) {
    this.edges = new Int32Array(size * 2);
    this.points = new Int32Array(size);
    this.pinEnds = new Int32Array(size);
  }
  private static mark(array: Int32Array, index: number, net: number) {
    const old = array[index];
    array[index] = old === 0 || old === net ? net : -1;
  }
  /** Records a path given as point indices along the grid (neighbours in sequence). */
  take(path: number[], net: number) {
    for (let i = 0; i < path.length; i++) {
      Occupancy.mark(this.points, path[i], net);
      if (i === 0) continue;
      const a = Math.min(path[i - 1], path[i]);
      const b = Math.max(path[i - 1], path[i]);
      Occupancy.mark(this.edges, a * 2 + (b - a === 1 ? 0 : 1), net);
    }
  }
  markPinEnd(index: number, net: number) {
    Occupancy.mark(this.pinEnds, index, net);
  }
}

const foreign = (owner: number, net: number) => owner !== 0 && owner !== net;

/**
 * The search's per-state arrays, allocated once per routing and reset for each wire by filling (a fill of a few
 * thousand entries is far cheaper than allocating fresh arrays for every wire).
 */
class SearchScratch {
  readonly cost: Float64Array;
  readonly from: Int32Array;
  readonly closed: Uint8Array;
  constructor(states: number) {
    this.cost = new Float64Array(states);
    this.from = new Int32Array(states);
    this.closed = new Uint8Array(states);
  }
  next() {
    this.cost.fill(Number.POSITIVE_INFINITY);
    this.from.fill(-1);
    this.closed.fill(0);
    return this;
  }
}

/**
 * A* from the source's escape point (travelling outward) to the target's escape point (arriving inward), over free
 * points; the cost is length, plus a bend cost per turn, plus the occupancy costs. Returns point indices or null.
 */
function search(
  grid: Grid,
  start: number,
  startDir: number,
  goal: number,
  goalDir: number,
  net: number,
  occupancy: Occupancy,
  options: RouteOptions,
  scratch: SearchScratch,
): number[] | null {
  const nx = grid.xs.length;
  const { cost, from, closed } = scratch.next();
  const gx = grid.xs[goal % nx];
  const gy = grid.ys[Math.floor(goal / nx)];
  // length to go plus the fewest bends still needed (both admissible, so A* still finds the cheapest path)
  const heuristic = (p: number, d: number) => {
    const dx = gx - grid.xs[p % nx];
    const dy = gy - grid.ys[Math.floor(p / nx)];
    const hx = dx > 0 ? 0 : 2;
    const hy = dy > 0 ? 1 : 3;
    let bends = 0;
    if (dx !== 0 && dy !== 0) bends = d === hx || d === hy ? 1 : 2;
    else if (dx !== 0) bends = d === hx ? 0 : d === opposite(hx) ? 2 : 1;
    else if (dy !== 0) bends = d === hy ? 0 : d === opposite(hy) ? 2 : 1;
    return Math.abs(dx) + Math.abs(dy) + bends * options.bendCost;
  };
  const heap = new MinHeap();
  const first = start * 4 + startDir;
  cost[first] = 0;
  heap.push(first, heuristic(start, startDir));
  while (heap.size > 0) {
    const state = heap.pop();
    if (closed[state]) continue;
    closed[state] = 1;
    const p = state >> 2;
    const d = state & 3;
    if (p === goal) {
      // arriving against the pin's inward direction costs the bend (or two) still to come
      if (d !== goalDir && !closed[goal * 4 + goalDir]) {
        const extra = d === opposite(goalDir) ? 2 * options.bendCost : options.bendCost;
        const finalState = goal * 4 + goalDir;
        if (cost[state] + extra < cost[finalState]) {
          cost[finalState] = cost[state] + extra;
          from[finalState] = state;
          heap.push(finalState, cost[finalState]);
        }
        continue;
      }
      return unwind(from, state);
    }
    const ix = p % nx;
    const iy = (p - ix) / nx;
    for (let nd = 0; nd < 4; nd++) {
      if (nd === opposite(d)) continue;
      const jx = ix + DX[nd];
      const jy = iy + DY[nd];
      if (jx < 0 || jy < 0 || jx >= nx || jy >= grid.ys.length) continue;
      const q = jy * nx + jx;
      if (grid.blocked[q] === HARD && q !== goal) continue;
      const length = Math.abs(grid.xs[jx] - grid.xs[ix]) + Math.abs(grid.ys[jy] - grid.ys[iy]);
      const edge = Math.min(p, q) * 2 + (nd === 0 || nd === 2 ? 0 : 1);
      let step = occupancy.edges[edge] === net ? SAME_NET_SHARE * length : length;
      if (nd !== d) step += options.bendCost + (foreign(occupancy.points[p], net) ? FOREIGN_PIN_COST : 0);
      if (foreign(occupancy.edges[edge], net)) step += SHARED_LINE_COST * length;
      else if (foreign(occupancy.points[q], net)) step += CROSSING_COST;
      if (foreign(occupancy.pinEnds[q], net)) step += FOREIGN_PIN_COST;
      if (grid.blocked[q] === SOFT) step += CLEARANCE_COST * length;
      const next = q * 4 + nd;
      const total = cost[state] + step;
      if (total < cost[next]) {
        cost[next] = total;
        from[next] = state;
        heap.push(next, total + heuristic(q, nd));
      }
    }
  }
  return null;
}

function unwind(from: Int32Array, last: number): number[] {
  const path: number[] = [];
  let previous = -1;
  for (let s = last; s !== -1; s = from[s]) {
    const p = s >> 2;
    if (p !== previous) path.push(p);
    previous = p;
  }
  return path.reverse();
}

/** Drops the points that lie on a straight line between their neighbours. */
export function corners(points: Point[]): Point[] {
  const out: Point[] = [];
  for (const p of points) {
    const n = out.length;
    if (n > 0 && out[n - 1].x === p.x && out[n - 1].y === p.y) continue;
    if (n >= 2) {
      const a = out[n - 2];
      const b = out[n - 1];
      if ((a.x === b.x && b.x === p.x) || (a.y === b.y && b.y === p.y)) out[n - 1] = p;
      else out.push(p);
    } else out.push(p);
  }
  return out;
}

/** The path drawn when no clear way exists: out of each pin by one grid step, then a step between. */
export function steppedPath(from: WireEnd, to: WireEnd, grid: number): Point[] {
  const out = (end: WireEnd): Point => ({
    x: end.point.x + DX[OUTWARD[end.side]] * grid,
    y: end.point.y + DY[OUTWARD[end.side]] * grid,
  });
  const a = out(from);
  const b = out(to);
  const horizontalFirst = from.side === "left" || from.side === "right";
  const middle = horizontalFirst
    ? [
        { x: (a.x + b.x) / 2, y: a.y },
        { x: (a.x + b.x) / 2, y: b.y },
      ]
    : [
        { x: a.x, y: (a.y + b.y) / 2 },
        { x: b.x, y: (a.y + b.y) / 2 },
      ];
  return corners([from.point, a, ...middle, b, to.point]);
}

const manhattan = (w: WireRequest) => Math.abs(w.from.point.x - w.to.point.x) + Math.abs(w.from.point.y - w.to.point.y);

/**
 * Routes every wire. Shorter wires go first, so the direct ones get their straight lines and the long ones go round;
 * the result is the same for the same input (ties keep the given order).
 */
export function routeWires(
  obstacles: readonly Obstacle[],
  wires: readonly WireRequest[],
  options: RouteOptions = DEFAULT_ROUTE_OPTIONS,
  /** pins with no wire yet: no route passes through one (it would look joined to it) */
  freePins: readonly Point[] = [],
): Map<string, RoutedWire> {
  const routes = new Map<string, RoutedWire>();
  if (wires.length === 0) return routes;
  const grid = buildGrid(obstacles, wires, options, freePins);
  const nx = grid.xs.length;
  const occupancy = new Occupancy(grid.blocked.length);
  const scratch = new SearchScratch(grid.blocked.length * 4);
  const netIds = new Map<string, number>();
  const netOf = (net: string) => {
    if (!netIds.has(net)) netIds.set(net, netIds.size + 1);
    return netIds.get(net) as number;
  };
  const escapes = new Map<WireEnd, number[] | null>();
  for (const wire of wires) {
    for (const end of [wire.from, wire.to]) {
      const walked = walkOut(grid, end, obstacles, options.clearance);
      escapes.set(end, walked);
      if (walked) occupancy.markPinEnd(walked[walked.length - 1], netOf(wire.net));
    }
  }
  const order = wires.map((w, i) => ({ w, i })).sort((a, b) => manhattan(a.w) - manhattan(b.w) || a.i - b.i);
  for (const { w } of order) {
    const net = netOf(w.net);
    if (facing(w.from, w.to, obstacles)) {
      routes.set(w.id, { points: [w.from.point, w.to.point], routed: true });
      continue;
    }
    const out = escapes.get(w.from);
    const back = escapes.get(w.to);
    const middle =
      out && back
        ? search(
            grid,
            out[out.length - 1],
            OUTWARD[w.from.side],
            back[back.length - 1],
            opposite(OUTWARD[w.to.side]),
            net,
            occupancy,
            options,
            scratch,
          )
        : null;
    if (!out || !back || !middle) {
      routes.set(w.id, { points: steppedPath(w.from, w.to, options.grid), routed: false });
      continue;
    }
    const path = [...out.slice(0, -1), ...middle, ...[...back].reverse().slice(1)];
    occupancy.take(path, net);
    const points = path.map((p) => ({ x: grid.xs[p % nx], y: grid.ys[Math.floor(p / nx)] }));
    routes.set(w.id, { points: corners(points), routed: true });
  }
  return routes;
}

/** An SVG path through the points. */
export function svgPath(points: readonly Point[]): string {
  return points.map((p, i) => `${i === 0 ? "M" : "L"} ${p.x} ${p.y}`).join(" ");
}
