/**
 * How wide each part's designator and value may be drawn. A value typed after the part was placed can make its
 * text wider than the room beside it, and the text would then lie over the next part or its text. Each label keeps
 * its natural width where it fits and is otherwise cut back (the canvas ends it with an ellipsis and shows the whole
 * text on hover) so that it keeps LABEL_ROOM_GAP clear of every other item. Parts are not moved: the drawing is
 * the designer's.
 *
 * Labels are settled left to right. One settled earlier counts at its final width; one still to come counts at its
 * narrowest (the symbol's width, or its designator line), so two labels reaching for the same gap can never meet.
 * A label is never cut below its narrowest: in a drawing crowded tighter than that the overlap stays.
 */
import { downwardPinXs, labelLeft, widthUnderSymbol } from "../symbols/label-place";
import { rotatedSize } from "../symbols/pin-layout";
import type { BenchPart } from "./circuit";
import { PART_LABEL_BAND, partLabelRect, type Rect } from "./free-spot";
import type { Placement } from "./layout";

/** Room kept between a label and the item beside it, in canvas units (px at zoom 1). */
export const LABEL_ROOM_GAP = 8;

export interface LabelledPart {
  part: BenchPart;
  placement: Placement;
  keyText: string;
}

interface LabelSpan {
  /** the label's natural box (partLabelRect) */
  natural: Rect;
  /** its narrowest box: what it is never cut below */
  narrowest: Rect;
  /** null: centred under the symbol, so it is cut from both sides alike */
  centre: number | null;
}

/** The text's width at which a label is never cut further: the designator line, and at least the symbol's width. */
function narrowestWidth(part: BenchPart, placement: Placement, natural: Rect): number {
  const designator = partLabelRect(part, placement, "").width;
  return Math.min(natural.width, Math.max(widthUnderSymbol(part.kind, placement.rotation), designator));
}

function spanOf({ part, placement, keyText }: LabelledPart): LabelSpan {
  const natural = partLabelRect(part, placement, keyText);
  const width = narrowestWidth(part, placement, natural);
  const centred = labelLeft(part.kind, placement.rotation) === null;
  const centre = centred ? natural.x + natural.width / 2 : null;
  const x = centre === null ? natural.x : centre - width / 2;
  return { natural, narrowest: { ...natural, x, width }, centre };
}

/**
 * The wire leaving a downward pin runs down through the band under its symbol, where a neighbour's label could
 * reach: a line as deep as the band at the pin, kept clear like any item.
 */
function downwardWires({ part, placement }: LabelledPart): Rect[] {
  const y = placement.y + rotatedSize(part.kind, placement.rotation).height;
  return downwardPinXs(part.kind, placement.rotation).map((x) => ({
    x: placement.x + x - 1,
    y,
    width: 2,
    height: PART_LABEL_BAND,
  }));
}

const sharesRows = (a: Rect, b: Rect) => a.y < b.y + b.height && b.y < a.y + a.height;

/** The widest the label may be among `others` (boxes of other items), never below its narrowest. */
function fittedWidth(span: LabelSpan, others: readonly Rect[]): number {
  const { natural, narrowest, centre } = span;
  // the label's inner edges: what a neighbour must lie beyond to count as beside it (not under the label already)
  const innerLeft = narrowest.x;
  const innerRight = narrowest.x + narrowest.width;
  let right = Number.POSITIVE_INFINITY;
  let left = Number.NEGATIVE_INFINITY;
  for (const other of others) {
    if (!sharesRows(natural, other)) continue;
    if (other.x >= innerRight) right = Math.min(right, other.x - LABEL_ROOM_GAP);
    else if (other.x + other.width <= innerLeft) left = Math.max(left, other.x + other.width + LABEL_ROOM_GAP);
  }
  const room = centre === null ? right - natural.x : 2 * Math.min(right - centre, centre - left);
  return Math.max(narrowest.width, Math.min(natural.width, room));
}

/**
 * The width each cut label is drawn at, by part id; a part whose label fits as it is has no entry. `obstacles` are
 * the boxes of everything else on the canvas: every part's symbol, ground symbols and net labels.
 */
export function labelWidths(parts: readonly LabelledPart[], obstacles: readonly Rect[]): Map<string, number> {
  const spans = parts.map((p) => ({ id: p.part.id, labelled: p, span: spanOf(p) }));
  const order = [...spans].sort(
    (a, b) => a.span.narrowest.x - b.span.narrowest.x || a.span.natural.y - b.span.natural.y,
  );
  const kept = [...obstacles, ...parts.flatMap(downwardWires)];
  const settled = new Map<string, Rect>();
  const widths = new Map<string, number>();
  for (const { id, labelled, span } of order) {
    const labels = spans
      .filter((other) => other.id !== id)
      .map((other) => settled.get(other.id) ?? other.span.narrowest);
    const width = fittedWidth(span, [...kept, ...labels]);
    const cut = width < span.natural.width;
    settled.set(id, drawnLabelRect(labelled, cut ? width : null));
    if (cut) widths.set(id, width);
  }
  return widths;
}

/** The box a part's label is drawn in: its natural box, or cut back to `width` about the same centre or left edge. */
export function drawnLabelRect({ part, placement, keyText }: LabelledPart, width: number | null): Rect {
  const natural = partLabelRect(part, placement, keyText);
  if (width === null) return natural;
  const centred = labelLeft(part.kind, placement.rotation) === null;
  return { ...natural, width, x: centred ? natural.x + (natural.width - width) / 2 : natural.x };
}
