/**
 * Where a part's designator and key value sit: centred under the symbol, unless a pin faces down, whose wire would
 * then run straight through the text. Then the text starts just right of the rightmost downward pin, still under
 * the symbol, and the wire passes beside it. Shared by the canvas (part-node.tsx) and the footprints the placement
 * and the wire router keep clear of (document/free-spot.ts).
 */
import type { PartKind } from "@/sim/circuit/types";
import { rotatedPinOffset, rotatedSide, SYMBOL_BOXES } from "./pin-layout";

/** Room between a downward pin's wire and the text beside it (canvas units): more than the wire and the pin's name. */
export const LABEL_PIN_GAP = 8;

/** `null`: centred under the symbol; a number: the text's left edge, from the box's left (rotated box). */
export function labelLeft(kind: PartKind, rotation: number): number | null {
  const pins = SYMBOL_BOXES[kind].pins;
  const downward = Object.entries(pins)
    .filter(([, place]) => rotatedSide(place.side, rotation) === "bottom")
    .map(([pin]) => rotatedPinOffset(kind, pin, rotation).x);
  return downward.length === 0 ? null : Math.max(...downward) + LABEL_PIN_GAP;
}
