/**
 * Where a part's designator and key value sit: centred under the symbol, unless a pin faces down, whose wire would
 * then run straight through the text. Then the text starts just right of the rightmost downward pin, still under
 * the symbol, and the wire passes beside it. Shared by the canvas (part-node.tsx) and the footprints the placement
 * and the wire router keep clear of (document/free-spot.ts).
 */
import type { PartKind } from "@/sim/circuit/types";
import { rotatedPinOffset, rotatedSide, rotatedSize, SYMBOL_BOXES } from "./pin-layout";

/** Room between a downward pin's wire and the text beside it (canvas units): more than the wire and the pin's name. */
export const LABEL_PIN_GAP = 8;

/** The x of each pin that faces down at this rotation, from the rotated box's left (their wires run down). */
export function downwardPinXs(kind: PartKind, rotation: number): number[] {
  return Object.entries(SYMBOL_BOXES[kind].pins)
    .filter(([, place]) => rotatedSide(place.side, rotation) === "bottom")
    .map(([pin]) => rotatedPinOffset(kind, pin, rotation).x);
}

/** `null`: centred under the symbol; a number: the text's left edge, from the box's left (rotated box). */
export function labelLeft(kind: PartKind, rotation: number): number | null {
  const downward = downwardPinXs(kind, rotation);
  return downward.length === 0 ? null : Math.max(...downward) + LABEL_PIN_GAP;
}

/** How much of the symbol's width lies above the label: all of it when centred, else right of its left edge. */
export function widthUnderSymbol(kind: PartKind, rotation: number): number {
  const width = rotatedSize(kind, rotation).width;
  const left = labelLeft(kind, rotation);
  return left === null ? width : Math.max(0, width - left);
}
