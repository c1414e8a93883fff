/**
 * A readable first drawing for a circuit that has none (an imported file, an example, a starting point written as
 * a plain circuit): parts in columns by their distance along the nets from the capsule (or the first input source,
 * or the first part), so the signal reads left to right; one ground symbol under each part with grounded pins; each
 * other net drawn as a chain of wires between its pins, left to right.
 */
import { GROUND } from "@/sim/circuit/types";
import { pinOffset, SYMBOL_BOXES } from "../symbols/pin-layout";
import type { BenchCircuit, BenchPart } from "./circuit";
import { nextFreeId } from "./ids";
import { type BenchLayout, emptyLayout, GRID, type Placement, type Wire } from "./layout";

/**
 * Distance between columns and rows, canvas units (room for the symbol, its labels and the wires). A row holds the
 * tallest upright symbol (100), the ground symbol under it (GROUND_DROP + 40) and a grid of room for a wire before
 * the next row: 200 let a ground touch the pin of the part below.
 */
const COLUMN_STEP = 260;
const ROW_STEP = 240;
/** How far below its part a ground symbol sits. */
const GROUND_DROP = 60;

const snap = (value: number) => Math.round(value / GRID) * GRID;

function startPart(parts: BenchPart[]): BenchPart | undefined {
  return (
    parts.find((p) => p.kind === "capsule") ??
    parts.find((p) => (p.kind === "vsource" || p.kind === "isource") && p.role === "input") ??
    parts[0]
  );
}

/** Column of each part: breadth-first distance over shared non-ground nets; unreached parts go after the rest. */
function columns(parts: BenchPart[]): Map<string, number> {
  const byNet = new Map<string, BenchPart[]>();
  for (const part of parts) {
    for (const net of new Set(Object.values(part.pins))) {
      if (net === GROUND) continue;
      byNet.set(net, [...(byNet.get(net) ?? []), part]);
    }
  }
  const column = new Map<string, number>();
  let nextStart = startPart(parts);
  let offset = 0;
  while (nextStart) {
    const queue: BenchPart[] = [nextStart];
    column.set(nextStart.id, offset);
    let deepest = offset;
    while (queue.length > 0) {
      const part = queue.shift() as BenchPart;
      const depth = column.get(part.id) as number;
      deepest = Math.max(deepest, depth);
      for (const net of new Set(Object.values(part.pins))) {
        for (const other of byNet.get(net) ?? []) {
          if (!column.has(other.id)) {
            column.set(other.id, depth + 1);
            queue.push(other);
          }
        }
      }
    }
    offset = deepest + 1;
    nextStart = parts.find((p) => !column.has(p.id));
  }
  return column;
}

export function placeParts(parts: BenchPart[]): Record<string, Placement> {
  const column = columns(parts);
  const rowsUsed = new Map<number, number>();
  const placements: Record<string, Placement> = {};
  for (const part of parts) {
    const c = column.get(part.id) ?? 0;
    const row = rowsUsed.get(c) ?? 0;
    rowsUsed.set(c, row + 1);
    placements[part.id] = { x: snap(c * COLUMN_STEP), y: snap(row * ROW_STEP), rotation: 0 };
  }
  return placements;
}

/**
 * Wires, grounds for a circuit whose parts are already placed (rotation 0 assumed for the geometry): the drawing's
 * nets equal the circuit's. Net labels are not needed: the pins keep their net names as hints (see nets.ts).
 */
export function drawNets(circuit: BenchCircuit, placements: Record<string, Placement>): BenchLayout {
  const layout = emptyLayout();
  layout.parts = placements;
  const wires: Wire[] = [];
  const wireId = () => `w${wires.length + 1}`;
  const pinPoint = (part: BenchPart, pin: string) => {
    const at = placements[part.id] ?? { x: 0, y: 0 };
    const offset = pinOffset(part.kind, pin);
    return { x: at.x + offset.x, y: at.y + offset.y };
  };
  const byNet = new Map<string, { part: BenchPart; pin: string }[]>();
  for (const part of circuit.parts) {
    const groundPins = Object.entries(part.pins).filter(([, net]) => net === GROUND);
    if (groundPins.length > 0) {
      const groundId = nextFreeId("g", Object.keys(layout.grounds));
      const at = placements[part.id] ?? { x: 0, y: 0 };
      const box = SYMBOL_BOXES[part.kind];
      const first = pinPoint(part, groundPins[0][0]);
      // under the pin, one grid step out for a side pin, so its wire leaves the pin and turns down once
      const side = box.pins[groundPins[0][0]]?.side;
      const out = side === "right" ? GRID : side === "left" ? -GRID : 0;
      layout.grounds[groundId] = { x: snap(first.x + out - GRID), y: snap(at.y + box.height + GROUND_DROP) };
      for (const [pin] of groundPins) {
        wires.push({ id: wireId(), from: { kind: "pin", part: part.id, pin }, to: { kind: "ground", id: groundId } });
      }
    }
    for (const [pin, net] of Object.entries(part.pins)) {
      if (net === GROUND) continue;
      byNet.set(net, [...(byNet.get(net) ?? []), { part, pin }]);
    }
  }
  for (const pins of byNet.values()) {
    const sorted = [...pins].sort((a, b) => {
      const pa = pinPoint(a.part, a.pin);
      const pb = pinPoint(b.part, b.pin);
      return pa.x - pb.x || pa.y - pb.y;
    });
    for (let i = 1; i < sorted.length; i++) {
      wires.push({
        id: wireId(),
        from: { kind: "pin", part: sorted[i - 1].part.id, pin: sorted[i - 1].pin },
        to: { kind: "pin", part: sorted[i].part.id, pin: sorted[i].pin },
      });
    }
  }
  layout.wires = wires;
  return layout;
}

export function autoLayout(circuit: BenchCircuit): BenchLayout {
  return drawNets(circuit, placeParts(circuit.parts));
}
