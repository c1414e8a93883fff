/**
 * Every change the bench makes to a document, as pure functions document → document. Each one that can change
 * connections ends with `syncNets`, so the circuit's nets always equal the drawing's. Invalid requests (an id in
 * use, a net name that is taken) come back as `{ error }` with a message; they never change the document.
 */
import { GROUND, type PartKind } from "@/sim/circuit/types";
import type { BenchPart, BenchVariant, RawValue } from "../document/circuit";
import type { BenchDocument } from "../document/document";
import { nextDesignator, nextFreeId } from "../document/ids";
import {
  freeShift,
  groundFootprint,
  labelFootprint,
  occupied,
  partFootprint,
  type Rect,
} from "../document/free-spot";
import { type Endpoint, endpointKey, GRID, type Placement, type Rotation, type Wire } from "../document/layout";
import { syncNets } from "../document/nets";
import { newPart } from "../document/part-defaults";
import type { ItemRef, Selection } from "./selection";

export type EditResult = { ok: true; document: BenchDocument } | { ok: false; error: string };

const snap = (v: number) => Math.round(v / GRID) * GRID;

function synced(document: BenchDocument): BenchDocument {
  return syncNets(document.circuit, document.layout);
}

function nextWireId(wires: Wire[]): string {
  return nextFreeId(
    "w",
    wires.map((w) => w.id),
  );
}

/** What is drawn already, as footprints (a new item keeps clear of them). */
function taken(document: BenchDocument) {
  return occupied(document.layout, document.circuit.parts, document.circuit.parameters);
}

/** `at` snapped, moved on by whole grid steps until `footprintAt(at)` covers nothing drawn. */
function freePlace(document: BenchDocument, at: { x: number; y: number }, footprintAt: (at: { x: number; y: number }) => Rect) {
  const snapped = { x: snap(at.x), y: snap(at.y) };
  const { dx, dy } = freeShift(footprintAt(snapped), taken(document));
  return { x: snapped.x + dx, y: snapped.y + dy };
}

/** Adds a part with its box's top-left at `at`, or at the nearest grid point where it covers nothing drawn. */
export function addPart(document: BenchDocument, kind: PartKind, at: { x: number; y: number }) {
  const id = nextDesignator(
    kind,
    document.circuit.parts.map((p) => p.id),
  );
  const part = newPart(kind, id);
  const parameters = document.circuit.parameters;
  const spot = freePlace(document, at, (p) => partFootprint(part, { ...p, rotation: 0 }, parameters));
  const next: BenchDocument = {
    circuit: { ...document.circuit, parts: [...document.circuit.parts, part] },
    layout: {
      ...document.layout,
      parts: { ...document.layout.parts, [id]: { ...spot, rotation: 0 } },
    },
  };
  return { document: synced(next), id };
}

export function addGround(document: BenchDocument, at: { x: number; y: number }) {
  const id = nextFreeId("g", Object.keys(document.layout.grounds));
  const spot = freePlace(document, at, groundFootprint);
  return {
    document: {
      ...document,
      layout: { ...document.layout, grounds: { ...document.layout.grounds, [id]: spot } },
    },
    id,
  };
}

export function addNetLabel(document: BenchDocument, at: { x: number; y: number }, net: string) {
  const id = nextFreeId("n", Object.keys(document.layout.netLabels));
  const spot = freePlace(document, at, (p) => labelFootprint(net, p));
  const netLabels = { ...document.layout.netLabels, [id]: { ...spot, net } };
  return { document: synced({ ...document, layout: { ...document.layout, netLabels } }), id };
}

/** Moves a part, ground symbol or net label to `at` (snapped to the grid). */
export function moveItem(document: BenchDocument, item: ItemRef, at: { x: number; y: number }): BenchDocument {
  const x = snap(at.x);
  const y = snap(at.y);
  const layout = document.layout;
  if (item.kind === "part") {
    const old = layout.parts[item.id];
    if (!old || (old.x === x && old.y === y)) return document;
    return { ...document, layout: { ...layout, parts: { ...layout.parts, [item.id]: { ...old, x, y } } } };
  }
  if (item.kind === "ground") {
    if (!layout.grounds[item.id]) return document;
    return { ...document, layout: { ...layout, grounds: { ...layout.grounds, [item.id]: { x, y } } } };
  }
  const label = layout.netLabels[item.id];
  if (!label) return document;
  return { ...document, layout: { ...layout, netLabels: { ...layout.netLabels, [item.id]: { ...label, x, y } } } };
}

/** Turns the parts a quarter turn clockwise. */
export function rotateParts(document: BenchDocument, ids: string[]): BenchDocument {
  if (ids.length === 0) return document;
  const parts: Record<string, Placement> = { ...document.layout.parts };
  for (const id of ids) {
    const old = parts[id];
    if (old) parts[id] = { ...old, rotation: ((old.rotation + 90) % 360) as Rotation };
  }
  return { ...document, layout: { ...document.layout, parts } };
}

function touches(endpoint: Endpoint, parts: Set<string>, grounds: Set<string>, labels: Set<string>): boolean {
  if (endpoint.kind === "pin") return parts.has(endpoint.part);
  if (endpoint.kind === "ground") return grounds.has(endpoint.id);
  return labels.has(endpoint.id);
}

/** Removes the selected items, every wire to a removed item, and removed parts from variants and notes. */
export function deleteItems(document: BenchDocument, selection: Selection): BenchDocument {
  const parts = new Set(selection.parts);
  const grounds = new Set(selection.grounds);
  const labels = new Set(selection.labels);
  const wires = new Set(selection.wires);
  if (parts.size + grounds.size + labels.size + wires.size === 0) return document;
  const { circuit, layout } = document;
  const without = <T>(record: Record<string, T>, ids: Set<string>) =>
    Object.fromEntries(Object.entries(record).filter(([id]) => !ids.has(id)));
  const next: BenchDocument = {
    circuit: {
      ...circuit,
      parts: circuit.parts.filter((p) => !parts.has(p.id)),
      variants: circuit.variants.map((v) => ({
        ...v,
        disable: v.disable.filter((id) => !parts.has(id)),
        enable: v.enable.filter((id) => !parts.has(id)),
      })),
    },
    layout: {
      ...layout,
      parts: without(layout.parts, parts),
      grounds: without(layout.grounds, grounds),
      netLabels: without(layout.netLabels, labels),
      wires: layout.wires.filter(
        (w) => !wires.has(w.id) && !touches(w.from, parts, grounds, labels) && !touches(w.to, parts, grounds, labels),
      ),
      notes: layout.notes.filter((n) => n.part === undefined || !parts.has(n.part)),
    },
  };
  return synced(next);
}

/** Draws a wire between two handles (nothing happens for a handle to itself or a wire that is already there). */
export function connect(document: BenchDocument, from: Endpoint, to: Endpoint): BenchDocument {
  const a = endpointKey(from);
  const b = endpointKey(to);
  if (a === b) return document;
  const exists = document.layout.wires.some((w) => {
    const x = endpointKey(w.from);
    const y = endpointKey(w.to);
    return (x === a && y === b) || (x === b && y === a);
  });
  if (exists) return document;
  const wire: Wire = { id: nextWireId(document.layout.wires), from, to };
  return synced({ ...document, layout: { ...document.layout, wires: [...document.layout.wires, wire] } });
}

export function disconnect(document: BenchDocument, wireIds: string[]): BenchDocument {
  const ids = new Set(wireIds);
  return synced({
    ...document,
    layout: { ...document.layout, wires: document.layout.wires.filter((w) => !ids.has(w.id)) },
  });
}

/** Applies `change` to one part; an unchanged part (same content) leaves the document as it is, so no undo step. */
function mapPart(document: BenchDocument, id: string, change: (part: BenchPart) => BenchPart): BenchDocument {
  let changed = false;
  const parts = document.circuit.parts.map((p) => {
    if (p.id !== id) return p;
    const next = change(p);
    if (JSON.stringify(next) === JSON.stringify(p)) return p;
    changed = true;
    return next;
  });
  return changed ? { ...document, circuit: { ...document.circuit, parts } } : document;
}

/** Sets (or, with `undefined`, removes, so the contract's default applies) one value of a part, as written. */
export function setValue(document: BenchDocument, id: string, field: string, raw: RawValue | undefined): BenchDocument {
  return mapPart(document, id, (part) => {
    const values = { ...part.values };
    if (raw === undefined) delete values[field];
    else values[field] = raw;
    return { ...part, values };
  });
}

export type PartPatch = Partial<
  Pick<BenchPart, "enabled" | "noiseless" | "role" | "notes" | "tolerance" | "tolerance_distribution" | "values">
>;

/** Changes the part's settings other than its id and pins. `role: undefined` or `notes: ""` removes them. */
export function updatePart(document: BenchDocument, id: string, patch: PartPatch): BenchDocument {
  return mapPart(document, id, (part) => {
    const next: BenchPart = { ...part, ...patch };
    if ("role" in patch && patch.role === undefined) delete next.role;
    if ("notes" in patch && !patch.notes) delete next.notes;
    return next;
  });
}

/** Renames a part everywhere: circuit, variants, layout, wires, notes. */
export function renamePart(document: BenchDocument, from: string, to: string): EditResult {
  const name = to.trim();
  if (name === from) return { ok: true, document };
  if (name === "") return { ok: false, error: "Give the part an id, such as R1." };
  if (document.circuit.parts.some((p) => p.id === name)) {
    return { ok: false, error: `${name} is already the id of another part. Choose an id no other part has.` };
  }
  if (!document.circuit.parts.some((p) => p.id === from)) return { ok: false, error: `There is no part ${from}.` };
  const rename = (id: string) => (id === from ? name : id);
  const renameEnd = (e: Endpoint): Endpoint => (e.kind === "pin" && e.part === from ? { ...e, part: name } : e);
  const { [from]: placement, ...otherPlacements } = document.layout.parts;
  return {
    ok: true,
    document: {
      circuit: {
        ...document.circuit,
        parts: document.circuit.parts.map((p) => (p.id === from ? { ...p, id: name } : p)),
        variants: document.circuit.variants.map((v) => ({
          ...v,
          disable: v.disable.map(rename),
          enable: v.enable.map(rename),
        })),
      },
      layout: {
        ...document.layout,
        parts: placement ? { ...otherPlacements, [name]: placement } : otherPlacements,
        wires: document.layout.wires.map((w) => ({ ...w, from: renameEnd(w.from), to: renameEnd(w.to) })),
        notes: document.layout.notes.map((n) => (n.part === from ? { ...n, part: name } : n)),
      },
    },
  };
}

/** Sets (or, with `undefined`, removes) a parameter of the design, as written. */
export function setParameter(document: BenchDocument, name: string, raw: RawValue | undefined): BenchDocument {
  const parameters = { ...document.circuit.parameters };
  if (raw === undefined) delete parameters[name];
  else parameters[name] = raw;
  const variants =
    raw === undefined
      ? document.circuit.variants.map((v) => {
          const { [name]: _gone, ...rest } = v.parameters;
          return { ...v, parameters: rest };
        })
      : document.circuit.variants;
  return { ...document, circuit: { ...document.circuit, parameters, variants } };
}

/** Names a net: its pins, the output and its net labels follow. Ground stays "0". */
export function setNetName(document: BenchDocument, net: string, name: string): EditResult {
  const wanted = name.trim();
  if (wanted === net) return { ok: true, document };
  if (net === GROUND) return { ok: false, error: 'Ground is always net "0"; it cannot be renamed.' };
  if (wanted === "") return { ok: false, error: "Give the net a name, such as out or gate." };
  if (wanted === GROUND)
    return { ok: false, error: 'To join a net to ground, wire it to a ground symbol; "0" is ground.' };
  const used = document.circuit.parts.some((p) => Object.values(p.pins).includes(wanted));
  if (used) return { ok: false, error: `Another net is already called ${wanted}. Choose a name no other net has.` };
  const rename = (n: string) => (n === net ? wanted : n);
  const netLabels = Object.fromEntries(
    Object.entries(document.layout.netLabels).map(([id, l]) => [id, { ...l, net: rename(l.net) }]),
  );
  const next: BenchDocument = {
    circuit: {
      ...document.circuit,
      parts: document.circuit.parts.map((p) => ({
        ...p,
        pins: Object.fromEntries(Object.entries(p.pins).map(([pin, n]) => [pin, rename(n)])),
      })),
      output: { plus: rename(document.circuit.output.plus), minus: rename(document.circuit.output.minus) },
    },
    layout: { ...document.layout, netLabels },
  };
  return { ok: true, document: synced(next) };
}

export function setOutput(document: BenchDocument, plus: string, minus: string): BenchDocument {
  return { ...document, circuit: { ...document.circuit, output: { plus, minus } } };
}

export function setVariants(document: BenchDocument, variants: BenchVariant[]): BenchDocument {
  return { ...document, circuit: { ...document.circuit, variants } };
}

export function setTitle(document: BenchDocument, title: string): BenchDocument {
  return { ...document, circuit: { ...document.circuit, title } };
}
