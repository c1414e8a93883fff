/**
 * The bench document: the contract's circuit file and the bench's drawing of it (`layout`), always in agreement —
 * the nets the wires make are the nets the pins name. A revision stores the two side by side; an exported file
 * carries the layout as an optional top-level field, which the engine ignores.
 */
import { autoLayout, drawNets } from "./auto-layout";
import { type BenchCircuit, normaliseCircuit } from "./circuit";
import { placeParts } from "./auto-layout";
import { type BenchLayout, readLayout } from "./layout";
import { canonicalPartition, syncNets } from "./nets";

export interface BenchDocument {
  circuit: BenchCircuit;
  layout: BenchLayout;
}

function samePartition(a: BenchCircuit, b: BenchCircuit): boolean {
  return JSON.stringify(canonicalPartition(a)) === JSON.stringify(canonicalPartition(b));
}

/**
 * Opens a circuit (already accepted by the engine) with its stored layout, if any. A missing layout is drawn
 * automatically; parts missing from the layout are placed; a layout whose wires no longer make the circuit's nets
 * (the circuit was changed elsewhere) keeps its placements and gets its wires redrawn. The circuit's connections
 * always win over the drawing's.
 */
export function openDocument(circuitFile: unknown, storedLayout?: unknown): BenchDocument {
  const circuit = normaliseCircuit(circuitFile);
  const stored = readLayout(storedLayout ?? (circuitFile as { layout?: unknown } | null)?.layout);
  // the layout lives beside the circuit, never inside it
  delete (circuit as Record<string, unknown>).layout;
  if (!stored) return { circuit, layout: autoLayout(circuit) };
  const placed = placeParts(circuit.parts);
  const parts = Object.fromEntries(circuit.parts.map((p) => [p.id, stored.parts[p.id] ?? placed[p.id]]));
  const layout = { ...stored, parts };
  const synced = syncNets(circuit, layout);
  if (samePartition(synced.circuit, circuit)) return synced;
  return { circuit, layout: { ...drawNets(circuit, parts), notes: stored.notes } };
}

/** The body of a save: the circuit file and the layout, separately. */
export function toRevisionBody(document: BenchDocument): { circuit: BenchCircuit; layout: BenchLayout } {
  return { circuit: document.circuit, layout: document.layout };
}

/** One self-contained file for download: the circuit with its drawing as the optional `layout` field. */
export function toExportFile(document: BenchDocument): BenchCircuit & { layout: BenchLayout } {
  return { ...document.circuit, layout: document.layout };
}
