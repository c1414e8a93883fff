/**
 * Where a new item lands on the canvas: the grid point nearest the one asked for at which its footprint keeps
 * clear of every part, ground symbol and net label already drawn, so a part dropped or added from the tray never
 * covers another. Footprints are canvas units (px at zoom 1) and include what is drawn outside a symbol's box: the
 * designator and key value under a part.
 */
import type { PartKind } from "@/sim/circuit/types";
import { rotatedSize } from "../symbols/pin-layout";
import { type BenchLayout, GRID, type Rotation } from "./layout";

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** The designator and key value under a part: two lines of 11 px and 10 px text and a 4 px gap (part-node.tsx). */
export const PART_LABEL_BAND = 40;
/** Kept clear around every footprint, so a wire and a pin's name have room between two items. */
export const CLEARANCE = GRID;
/** The ground symbol's node (ground-node.tsx: 40 × 40). */
const GROUND_SIZE = { width: 40, height: 40 };
/** A net label's node is 24 px high; its width follows the name (11 px monospace ≈ 7 px a letter, 24 px padding). */
const labelSize = (net: string) => ({ width: 24 + 7 * net.length, height: 24 });
/** How far from the asked-for point a free spot is looked for, in grid steps (beyond it, the asked-for point). */
const SEARCH_STEPS = 40;

/**
 * What a part occupies when its box's top-left sits at (x, y). A label wider than a short symbol is not known
 * here; the clearance covers the usual ones ("MIC1", "1 GΩ").
 */
export function partFootprint(kind: PartKind, rotation: Rotation, x: number, y: number): Rect {
  const size = rotatedSize(kind, rotation);
  return { x, y, width: size.width, height: size.height + PART_LABEL_BAND };
}

export function groundFootprint(x: number, y: number): Rect {
  return { x, y, ...GROUND_SIZE };
}

export function labelFootprint(net: string, x: number, y: number): Rect {
  return { x, y, ...labelSize(net) };
}

/** Every footprint on the canvas, parts by their kind (`kinds` maps a part id to its kind). */
export function occupied(layout: BenchLayout, kinds: ReadonlyMap<string, PartKind>): Rect[] {
  const rects: Rect[] = [];
  for (const [id, p] of Object.entries(layout.parts)) {
    const kind = kinds.get(id);
    if (kind) rects.push(partFootprint(kind, p.rotation, p.x, p.y));
  }
  for (const g of Object.values(layout.grounds)) rects.push(groundFootprint(g.x, g.y));
  for (const l of Object.values(layout.netLabels)) rects.push(labelFootprint(l.net, l.x, l.y));
  return rects;
}

/** True when a and b come closer than `gap` (touching at exactly `gap` is clear). */
export function overlaps(a: Rect, b: Rect, gap = 0): boolean {
  return (
    a.x < b.x + b.width + gap && b.x < a.x + a.width + gap && a.y < b.y + b.height + gap && b.y < a.y + a.height + gap
  );
}

const snap = (v: number) => Math.round(v / GRID) * GRID;

/**
 * Grid offsets within SEARCH_STEPS of the origin, nearest first; of equally near ones, below before above and right
 * before left (the way a drawing grows), so the choice is repeatable.
 */
const OFFSETS: ReadonlyArray<readonly [number, number]> = (() => {
  const list: [number, number][] = [];
  for (let dy = -SEARCH_STEPS; dy <= SEARCH_STEPS; dy++)
    for (let dx = -SEARCH_STEPS; dx <= SEARCH_STEPS; dx++) list.push([dx, dy]);
  return list.sort((a, b) => a[0] ** 2 + a[1] ** 2 - (b[0] ** 2 + b[1] ** 2) || b[1] - a[1] || b[0] - a[0]);
})();

/**
 * The snapped top-left nearest `at` where a footprint of `size` clears every rect in `taken` by CLEARANCE. When
 * nothing within the search is free (a crowded drawing), `at` snapped: the item is placed where it was asked for.
 */
export function freeSpot(
  at: { x: number; y: number },
  size: { width: number; height: number },
  taken: readonly Rect[],
): { x: number; y: number } {
  const x0 = snap(at.x);
  const y0 = snap(at.y);
  for (const [dx, dy] of OFFSETS) {
    const candidate = { x: x0 + dx * GRID, y: y0 + dy * GRID, width: size.width, height: size.height };
    if (!taken.some((r) => overlaps(candidate, r, CLEARANCE))) return { x: candidate.x, y: candidate.y };
  }
  return { x: x0, y: y0 };
}

/** The top-left of a kind's unrotated box centred on `centre` (a drop lands under the pointer, not beside it). */
export function boxCentredOn(kind: PartKind, centre: { x: number; y: number }): { x: number; y: number } {
  const size = rotatedSize(kind, 0);
  return { x: centre.x - size.width / 2, y: centre.y - size.height / 2 };
}
