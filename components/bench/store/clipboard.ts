/**
 * Copy and paste of parts: the selected parts with their placements, the wires between them and the ground
 * symbols wired to them. Pasted parts get the next free designators; the copy moves as one piece to the nearest free
 * space below-right of the original (free-spot.ts), so it covers nothing already drawn; its nets are new (a pasted
 * follower is not wired to the original's nets).
 */
import type { BenchPart } from "../document/circuit";
import type { BenchDocument } from "../document/document";
import { freeShift, groundFootprint, occupied, partFootprint, type Rect } from "../document/free-spot";
import { nextDesignator, nextFreeId } from "../document/ids";
import { type Endpoint, GRID, type Placement, type Wire } from "../document/layout";
import { syncNets } from "../document/nets";
import type { Selection } from "./selection";

export interface Clip {
  parts: BenchPart[];
  placements: Record<string, Placement>;
  grounds: Record<string, { x: number; y: number }>;
  wires: Wire[];
}

/** How far below-right of the original a paste is first tried, canvas units. */
const PASTE_OFFSET = 2 * GRID;

/** The smallest rect holding every footprint of the clip, where it was copied from. */
function clipBounds(clip: Clip, parameters: BenchDocument["circuit"]["parameters"]): Rect {
  const rects = [
    ...clip.parts.map((p) => partFootprint(p, clip.placements[p.id] ?? { x: 0, y: 0, rotation: 0 }, parameters)),
    ...Object.values(clip.grounds).map(groundFootprint),
  ];
  const x = Math.min(...rects.map((r) => r.x));
  const y = Math.min(...rects.map((r) => r.y));
  const right = Math.max(...rects.map((r) => r.x + r.width));
  const bottom = Math.max(...rects.map((r) => r.y + r.height));
  return { x, y, width: right - x, height: bottom - y };
}

/** The shift that takes the clip to the nearest free space from one PASTE_OFFSET below-right of where it was. */
function pasteShift(document: BenchDocument, clip: Clip): { dx: number; dy: number } {
  const { parts, parameters } = document.circuit;
  const bounds = clipBounds(clip, parameters);
  const start = { ...bounds, x: bounds.x + PASTE_OFFSET, y: bounds.y + PASTE_OFFSET };
  const { dx, dy } = freeShift(start, occupied(document.layout, parts, parameters));
  return { dx: PASTE_OFFSET + dx, dy: PASTE_OFFSET + dy };
}

export function copySelection(document: BenchDocument, selection: Selection): Clip | null {
  const ids = new Set(selection.parts);
  const parts = document.circuit.parts.filter((p) => ids.has(p.id));
  if (parts.length === 0) return null;
  const grounds = new Set(selection.grounds);
  const inside = (e: Endpoint) =>
    e.kind === "pin" ? ids.has(e.part) : e.kind === "ground" ? grounds.has(e.id) || false : false;
  // a ground symbol wired to a copied part comes along, so a copied stage stays grounded
  for (const w of document.layout.wires) {
    if (w.from.kind === "pin" && ids.has(w.from.part) && w.to.kind === "ground") grounds.add(w.to.id);
    if (w.to.kind === "pin" && ids.has(w.to.part) && w.from.kind === "ground") grounds.add(w.from.id);
  }
  return {
    parts,
    placements: Object.fromEntries(parts.map((p) => [p.id, document.layout.parts[p.id]])),
    grounds: Object.fromEntries(
      [...grounds].filter((g) => document.layout.grounds[g]).map((g) => [g, document.layout.grounds[g]]),
    ),
    wires: document.layout.wires.filter((w) => inside(w.from) && inside(w.to)),
  };
}

export function pasteClip(document: BenchDocument, clip: Clip): { document: BenchDocument; selection: Selection } {
  const usedIds = document.circuit.parts.map((p) => p.id);
  const partIds = new Map<string, string>();
  for (const part of clip.parts) {
    const id = nextDesignator(part.kind, usedIds);
    usedIds.push(id);
    partIds.set(part.id, id);
  }
  const groundIds = new Map<string, string>();
  const usedGrounds = Object.keys(document.layout.grounds);
  for (const g of Object.keys(clip.grounds)) {
    const id = nextFreeId("g", usedGrounds);
    usedGrounds.push(id);
    groundIds.set(g, id);
  }
  const { dx, dy } = pasteShift(document, clip);
  const moved = <T extends { x: number; y: number }>(at: T): T => ({ ...at, x: at.x + dx, y: at.y + dy });
  const mapEnd = (e: Endpoint): Endpoint =>
    e.kind === "pin"
      ? { ...e, part: partIds.get(e.part) as string }
      : e.kind === "ground"
        ? { ...e, id: groundIds.get(e.id) as string }
        : e;
  const wires = [...document.layout.wires];
  for (const w of clip.wires) {
    wires.push({
      id: nextFreeId(
        "w",
        wires.map((x) => x.id),
      ),
      from: mapEnd(w.from),
      to: mapEnd(w.to),
    });
  }
  const parts = clip.parts.map((p) => {
    const id = partIds.get(p.id) as string;
    // fresh nets named after the new part; syncNets joins those the pasted wires join
    return { ...p, id, pins: Object.fromEntries(Object.keys(p.pins).map((pin) => [pin, `${id}_${pin}`])) };
  });
  const next = syncNets(
    { ...document.circuit, parts: [...document.circuit.parts, ...parts] },
    {
      ...document.layout,
      parts: {
        ...document.layout.parts,
        ...Object.fromEntries(
          clip.parts.map((p) => [
            partIds.get(p.id) as string,
            moved(clip.placements[p.id] ?? { x: 0, y: 0, rotation: 0 }),
          ]),
        ),
      },
      grounds: {
        ...document.layout.grounds,
        ...Object.fromEntries(Object.entries(clip.grounds).map(([g, at]) => [groundIds.get(g) as string, moved(at)])),
      },
      wires,
    },
  );
  return {
    document: next,
    selection: { parts: [...partIds.values()], grounds: [...groundIds.values()], labels: [], wires: [] },
  };
}
