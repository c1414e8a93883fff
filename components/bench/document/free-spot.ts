/**
 * Where a new item lands on the canvas: the grid step nearest the place asked for at which its footprint keeps
 * clear of every part, ground symbol and net label already drawn, so a part dropped, added from the tray or pasted
 * never covers another. Footprints are canvas units (px at zoom 1) and include what is drawn outside a symbol's
 * box: the designator and key value under a part, which can be wider than a small symbol.
 */
import { keyValueText } from "../symbols/key-value";
import { labelLeft } from "../symbols/label-place";
import { rotatedSize } from "../symbols/pin-layout";
import type { BenchPart, RawValue } from "./circuit";
import { type BenchLayout, GRID, type Placement } from "./layout";

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** The designator and key value under a part: two lines of 11 px and 10 px text and a 4 px gap (part-node.tsx). */
export const PART_LABEL_BAND = 40;
/**
 * A monospace letter's advance at the 11 px designator size: about 0.6 em for the usual monospace faces (common
 * practice), rounded up. The value line is 10 px, so this over-reads it a little, on the safe side.
 */
const MONO_LETTER = 6.6;
/** The label's paper ground pads it by 4 px each side (px-1). */
const LABEL_PADDING = 8;
/** Kept clear around every footprint, so a wire and a pin's name have room between two items. */
export const CLEARANCE = GRID;
/** The ground symbol's node (ground-node.tsx: 40 × 40). */
const GROUND_SIZE = { width: 40, height: 40 };
/** A net label's node is 24 px high; its width follows the name (11 px monospace, 24 px of padding and point). */
const labelSize = (net: string) => ({ width: 24 + MONO_LETTER * net.length, height: 24 });
/** How far from the place asked for a free one is looked for, in grid steps (beyond it: the place asked for). */
const SEARCH_STEPS = 40;

/** What a part occupies at `placement`: its box, and the label under it centred on the box. */
export function partFootprint(part: BenchPart, placement: Placement, parameters: Record<string, RawValue>): Rect {
  return partFootprintWithText(part, placement, keyValueText(part, parameters));
}

/** `partFootprint` when the key value's text is known already (the canvas has it; no second parse). */
export function partFootprintWithText(part: BenchPart, placement: Placement, keyText: string): Rect {
  const size = rotatedSize(part.kind, placement.rotation);
  const label = partLabelRect(part, placement, keyText);
  const x = Math.min(placement.x, label.x);
  const right = Math.max(placement.x + size.width, label.x + label.width);
  return { x, y: placement.y, width: right - x, height: size.height + PART_LABEL_BAND };
}

/**
 * The designator and key value under a part: centred under the symbol, or starting beside its downward pin
 * (label-place.ts), in either case as wide as its longer line.
 */
export function partLabelRect(part: BenchPart, placement: Placement, keyText: string): Rect {
  const size = rotatedSize(part.kind, placement.rotation);
  const id = part.enabled ? part.id : `${part.id} (off)`;
  const width = Math.max(id.length, keyText.length) * MONO_LETTER + LABEL_PADDING;
  const left = labelLeft(part.kind, placement.rotation);
  const x = left === null ? placement.x + (size.width - width) / 2 : placement.x + left;
  return { x, y: placement.y + size.height, width, height: PART_LABEL_BAND };
}

export function groundFootprint(at: { x: number; y: number }): Rect {
  return { x: at.x, y: at.y, ...GROUND_SIZE };
}

export function labelFootprint(net: string, at: { x: number; y: number }): Rect {
  return { x: at.x, y: at.y, ...labelSize(net) };
}

/** Every footprint on the canvas. */
export function occupied(
  layout: BenchLayout,
  parts: readonly BenchPart[],
  parameters: Record<string, RawValue>,
): Rect[] {
  const rects: Rect[] = [];
  for (const part of parts) {
    const placement = layout.parts[part.id];
    if (placement) rects.push(partFootprint(part, placement, parameters));
  }
  for (const g of Object.values(layout.grounds)) rects.push(groundFootprint(g));
  for (const l of Object.values(layout.netLabels)) rects.push(labelFootprint(l.net, l));
  return rects;
}

/** True when a and b come closer than `gap` (exactly `gap` apart is clear). */
export function overlaps(a: Rect, b: Rect, gap = 0): boolean {
  return (
    a.x < b.x + b.width + gap && b.x < a.x + a.width + gap && a.y < b.y + b.height + gap && b.y < a.y + a.height + gap
  );
}

/**
 * Grid offsets within SEARCH_STEPS, nearest first; of equally near ones, below before above and right before left
 * (the way a drawing grows), so the choice is repeatable.
 */
const OFFSETS: ReadonlyArray<readonly [number, number]> = (() => {
  const list: [number, number][] = [];
  for (let dy = -SEARCH_STEPS; dy <= SEARCH_STEPS; dy++)
    for (let dx = -SEARCH_STEPS; dx <= SEARCH_STEPS; dx++) list.push([dx, dy]);
  return list.sort((a, b) => a[0] ** 2 + a[1] ** 2 - (b[0] ** 2 + b[1] ** 2) || b[1] - a[1] || b[0] - a[0]);
})();

/**
 * The smallest shift, in whole grid steps, that takes `footprint` clear of every rect in `taken` by CLEARANCE
 * ({0, 0} when it is clear where it is). When nothing within the search is free (a crowded drawing), {0, 0}: the
 * item goes where it was asked for.
 */
export function freeShift(footprint: Rect, taken: readonly Rect[]): { dx: number; dy: number } {
  for (const [sx, sy] of OFFSETS) {
    const moved = { ...footprint, x: footprint.x + sx * GRID, y: footprint.y + sy * GRID };
    if (!taken.some((r) => overlaps(moved, r, CLEARANCE))) return { dx: sx * GRID, dy: sy * GRID };
  }
  return { dx: 0, dy: 0 };
}

/** The top-left of a kind's unrotated box centred on `centre` (a drop lands under the pointer, not beside it). */
export function boxCentredOn(kind: BenchPart["kind"], centre: { x: number; y: number }): { x: number; y: number } {
  const size = rotatedSize(kind, 0);
  return { x: centre.x - size.width / 2, y: centre.y - size.height / 2 };
}

/** The top-left of the ground symbol centred on `centre`. */
export function groundCentredOn(centre: { x: number; y: number }): { x: number; y: number } {
  return { x: centre.x - GROUND_SIZE.width / 2, y: centre.y - GROUND_SIZE.height / 2 };
}
