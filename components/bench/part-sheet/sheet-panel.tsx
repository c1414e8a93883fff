"use client";
/** The right-hand panel: the part sheet of the one selected part, a net's sheet, or the design's sheet. */
import { netOfEndpoint } from "../canvas/flow-model";
import { useBench } from "../store/bench-store-context";
import { DesignSheet } from "./design-sheet";
import { NetSheet } from "./net-sheet";
import { PartSheet } from "./part-sheet";

export function SheetPanel() {
  const selection = useBench((s) => s.selection);
  const document = useBench((s) => s.document);
  const part =
    selection.parts.length === 1 ? document.circuit.parts.find((p) => p.id === selection.parts[0]) : undefined;
  if (part) return <PartSheet key={part.id} part={part} />;
  const count = selection.parts.length + selection.wires.length + selection.labels.length + selection.grounds.length;
  if (count > 1) {
    return <p className="text-sm text-ink-soft">{count} items selected. R turns the parts, Del removes them, Ctrl+C copies them.</p>;
  }
  const wire = selection.wires.length === 1 ? document.layout.wires.find((w) => w.id === selection.wires[0]) : undefined;
  const label = selection.labels.length === 1 ? document.layout.netLabels[selection.labels[0]] : undefined;
  const net = wire ? (netOfEndpoint(document, wire.from) ?? netOfEndpoint(document, wire.to)) : label?.net;
  if (net !== undefined) return <NetSheet key={net} net={net} />;
  return <DesignSheet />;
}
