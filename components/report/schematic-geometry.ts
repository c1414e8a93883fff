/**
 * The circuit picture of the sign-off report, drawn from the bench layout (pure): each part as a labelled box where
 * the bench placed it, each wire as a straight segment between the pins, ground symbols and net labels it joins,
 * all scaled to fit the page. A revision saved without a layout gets no picture (the report shows the parts table).
 */
import type { BenchCircuit } from "@/components/bench/document/circuit";
import type { BenchLayout, Endpoint } from "@/components/bench/document/layout";
import { rotatedPinOffset, rotatedSize } from "@/components/bench/symbols/pin-layout";
import type { PartKind } from "@/sim/circuit/types";

export interface SchematicGeometry {
  width: number;
  height: number;
  parts: { id: string; kind: string; x: number; y: number; width: number; height: number; enabled: boolean }[];
  wires: { x1: number; y1: number; x2: number; y2: number }[];
  grounds: { x: number; y: number }[];
  labels: { x: number; y: number; net: string }[];
  scale: number;
}

const MARGIN = 30;

export function schematicGeometry(circuit: BenchCircuit, layout: BenchLayout, fit: { width: number; height: number }): SchematicGeometry | null {
  const placed = circuit.parts.filter((p) => layout.parts[p.id]);
  if (placed.length === 0) return null;
  const kind = (id: string) => circuit.parts.find((p) => p.id === id)?.kind as PartKind;
  const boxes = placed.map((p) => {
    const at = layout.parts[p.id];
    const size = rotatedSize(p.kind as PartKind, at.rotation);
    return { id: p.id, kind: p.kind, x: at.x, y: at.y, width: size.width, height: size.height, enabled: p.enabled !== false };
  });
  const point = (e: Endpoint): { x: number; y: number } | null => {
    if (e.kind === "ground") return layout.grounds[e.id] ?? null;
    if (e.kind === "label") return layout.netLabels[e.id] ?? null;
    const at = layout.parts[e.part];
    if (!at || !kind(e.part)) return null;
    const off = rotatedPinOffset(kind(e.part), e.pin, at.rotation);
    return { x: at.x + off.x, y: at.y + off.y };
  };
  const rawWires = layout.wires.flatMap((w) => {
    const a = point(w.from);
    const b = point(w.to);
    return a && b ? [{ x1: a.x, y1: a.y, x2: b.x, y2: b.y }] : [];
  });
  const xs = [...boxes.flatMap((b) => [b.x, b.x + b.width]), ...Object.values(layout.grounds).map((g) => g.x), ...Object.values(layout.netLabels).map((l) => l.x)];
  const ys = [...boxes.flatMap((b) => [b.y, b.y + b.height]), ...Object.values(layout.grounds).map((g) => g.y + 20), ...Object.values(layout.netLabels).map((l) => l.y)];
  const minX = Math.min(...xs) - MARGIN;
  const minY = Math.min(...ys) - MARGIN;
  const spanX = Math.max(...xs) + MARGIN - minX;
  const spanY = Math.max(...ys) + MARGIN - minY;
  const scale = Math.min(fit.width / spanX, fit.height / spanY, 1.2);
  const tx = (v: number) => (v - minX) * scale;
  const ty = (v: number) => (v - minY) * scale;
  return {
    width: spanX * scale,
    height: spanY * scale,
    scale,
    parts: boxes.map((b) => ({ ...b, x: tx(b.x), y: ty(b.y), width: b.width * scale, height: b.height * scale })),
    wires: rawWires.map((w) => ({ x1: tx(w.x1), y1: ty(w.y1), x2: tx(w.x2), y2: ty(w.y2) })),
    grounds: Object.values(layout.grounds).map((g) => ({ x: tx(g.x), y: ty(g.y) })),
    labels: Object.values(layout.netLabels).map((l) => ({ x: tx(l.x), y: ty(l.y), net: l.net })),
  };
}
