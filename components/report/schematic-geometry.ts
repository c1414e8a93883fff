/**
 * The circuit picture of the sign-off report, drawn from the bench layout (pure): each part as its bench symbol
 * (symbol-geometry.ts, the same strokes the canvas draws) where the bench placed and turned it, its id and key value
 * beneath it as on the bench, each wire as a stepped line leaving its pins the way they face, ground symbols and net
 * labels; scaled so the whole picture, labels included, fits the page. A revision saved without a layout gets no
 * picture (the report shows the parts table).
 */
import type { BenchCircuit, RawValue } from "@/components/bench/document/circuit";
import type { BenchLayout, Endpoint } from "@/components/bench/document/layout";
import { keyValueText } from "@/components/bench/symbols/key-value";
import { rotatedPinOffset, rotatedSide, rotatedSize, type Side, SYMBOL_BOXES } from "@/components/bench/symbols/pin-layout";
import { GROUND_BOX, GROUND_STROKES, type SymbolStroke, symbolStrokes } from "@/components/bench/symbols/symbol-geometry";
import type { PartKind } from "@/sim/circuit/types";

/** A symbol placed on the picture: draw `strokes` under `transform` (symbol units to picture units). */
export interface PlacedSymbol {
  transform: string;
  strokes: SymbolStroke[];
}

export interface SchematicText {
  x: number;
  y: number;
  text: string;
}

export interface SchematicGeometry {
  width: number;
  height: number;
  scale: number;
  /** font size of part and net labels, picture units (PDF points) */
  fontSize: number;
  parts: (PlacedSymbol & { id: string; enabled: boolean; name: SchematicText; value: SchematicText | null; plate: Box })[];
  wires: { d: string }[];
  grounds: PlacedSymbol[];
  labels: { flag: string; text: SchematicText; net: string }[];
}

interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

const MARGIN = 20;
/** Label size: the bench's 10-unit value text at the picture's scale, kept between readable and not crowding. */
const labelFont = (scale: number) => Math.min(8, Math.max(6.5, 10 * scale));
/** A generous estimate of a Helvetica string's width (the standard faces average about 0.5 em; "Ω" is spelt "ohm" in the PDF). */
const textWidth = (s: string, size: number) => s.replace(/Ω/g, " ohm").length * size * 0.58;
const NET_FLAG_HEIGHT = 24;

export function schematicGeometry(
  circuit: BenchCircuit,
  layout: BenchLayout,
  fit: { width: number; height: number },
  parameters: Record<string, RawValue> = {},
): SchematicGeometry | null {
  const placed = circuit.parts.filter((p) => layout.parts[p.id]);
  if (placed.length === 0) return null;
  const kindOf = new Map(circuit.parts.map((p) => [p.id, p.kind as PartKind]));
  const symbols = placed.map((p) => {
    const at = layout.parts[p.id];
    const kind = p.kind as PartKind;
    const size = rotatedSize(kind, at.rotation);
    const type = typeof p.values.type === "string" ? p.values.type : undefined;
    return { id: p.id, kind, type, at, size, enabled: p.enabled !== false, name: p.enabled === false ? `${p.id} (off)` : p.id, value: keyValueText(p, parameters) };
  });
  // every endpoint in canvas units, with the way its pin faces (a wire leaves a pin straight out first)
  const endpoint = (e: Endpoint): { x: number; y: number; side: Side } | null => {
    if (e.kind === "ground") {
      const g = layout.grounds[e.id];
      return g ? { x: g.x + GROUND_BOX.pin.x, y: g.y + GROUND_BOX.pin.y, side: "top" } : null;
    }
    if (e.kind === "label") {
      const l = layout.netLabels[e.id];
      return l ? { x: l.x, y: l.y + NET_FLAG_HEIGHT / 2, side: "left" } : null;
    }
    const at = layout.parts[e.part];
    const kind = kindOf.get(e.part);
    if (!at || !kind) return null;
    const off = rotatedPinOffset(kind, e.pin, at.rotation);
    const side = rotatedSide(SYMBOL_BOXES[kind].pins[e.pin]?.side ?? "left", at.rotation);
    return { x: at.x + off.x, y: at.y + off.y, side };
  };
  const wireEnds = layout.wires.flatMap((w) => {
    const a = endpoint(w.from);
    const b = endpoint(w.to);
    return a && b ? [{ a, b }] : [];
  });
  const nets = Object.values(layout.netLabels);
  const grounds = Object.values(layout.grounds);

  // canvas-unit extent of the drawings; labels are in page units, so they are added once the scale is known
  const xs = [...symbols.flatMap((s) => [s.at.x, s.at.x + s.size.width]), ...grounds.flatMap((g) => [g.x, g.x + GROUND_BOX.width]), ...nets.map((l) => l.x)];
  const ys = [...symbols.flatMap((s) => [s.at.y, s.at.y + s.size.height]), ...grounds.flatMap((g) => [g.y, g.y + GROUND_BOX.height]), ...nets.flatMap((l) => [l.y, l.y + NET_FLAG_HEIGHT])];
  const minX = Math.min(...xs);
  const minY = Math.min(...ys);
  const draw = (scale: number, ox = 0, oy = 0) => {
    const font = labelFont(scale);
    const LINE = font * 1.25;
    const tx = (v: number) => (v - minX) * scale + ox;
    const ty = (v: number) => (v - minY) * scale + oy;
    const extent: Box[] = [];
    const parts = symbols.map((s) => {
      const box = SYMBOL_BOXES[s.kind];
      const cx = tx(s.at.x + s.size.width / 2);
      const cy = ty(s.at.y + s.size.height / 2);
      const bottom = ty(s.at.y + s.size.height);
      const lines = s.value ? [s.name, s.value] : [s.name];
      const plateWidth = Math.max(...lines.map((t) => textWidth(t, font))) + 4;
      const plate = { x: cx - plateWidth / 2, y: bottom + 2, width: plateWidth, height: lines.length * LINE + 2 };
      extent.push(plate, { x: tx(s.at.x), y: ty(s.at.y), width: s.size.width * scale, height: s.size.height * scale });
      return {
        id: s.id,
        enabled: s.enabled,
        // the bench turns a symbol clockwise about its centre
        transform: `translate(${cx} ${cy}) scale(${scale}) rotate(${s.at.rotation}) translate(${-box.width / 2} ${-box.height / 2})`,
        strokes: symbolStrokes(s.kind, s.type),
        name: { x: cx, y: plate.y + LINE - 1, text: s.name },
        value: s.value ? { x: cx, y: plate.y + 2 * LINE - 1, text: s.value } : null,
        plate,
      };
    });
    const groundSymbols = grounds.map((g) => {
      extent.push({ x: tx(g.x), y: ty(g.y), width: GROUND_BOX.width * scale, height: GROUND_BOX.height * scale });
      return { transform: `translate(${tx(g.x)} ${ty(g.y)}) scale(${scale})`, strokes: GROUND_STROKES };
    });
    const labels = nets.map((l) => {
      const x = tx(l.x);
      const mid = ty(l.y + NET_FLAG_HEIGHT / 2);
      const w = textWidth(l.net, font) + 12;
      const h = font + 5;
      extent.push({ x, y: mid - h / 2, width: w + h / 2, height: h });
      return {
        net: l.net,
        flag: `M${x} ${mid}L${x + h / 2} ${mid - h / 2}H${x + w}V${mid + h / 2}H${x + h / 2}Z`,
        text: { x: x + h / 2 + 2, y: mid + font / 2 - 1, text: l.net },
      };
    });
    const wires = wireEnds.map(({ a, b }) => ({ d: steppedWire({ x: tx(a.x), y: ty(a.y), side: a.side }, { x: tx(b.x), y: ty(b.y) }) }));
    const left = Math.min(...extent.map((e) => e.x)) - MARGIN;
    const top = Math.min(...extent.map((e) => e.y)) - MARGIN;
    const right = Math.max(...extent.map((e) => e.x + e.width)) + MARGIN;
    const bottomEdge = Math.max(...extent.map((e) => e.y + e.height)) + MARGIN;
    return { parts, groundSymbols, labels, wires, left, top, width: right - left, height: bottomEdge - top };
  };

  // start from the drawings' fit, then shrink until the labels fit too (they keep their size: readable)
  let scale = Math.min(fit.width / (Math.max(...xs) - minX + 2 * MARGIN), fit.height / (Math.max(...ys) - minY + 2 * MARGIN), 1.2);
  let drawn = draw(scale);
  for (let i = 0; i < 4 && (drawn.width > fit.width + 0.5 || drawn.height > fit.height + 0.5); i++) {
    scale *= Math.min(fit.width / drawn.width, fit.height / drawn.height) * 0.98;
    drawn = draw(scale);
  }
  // once more, moved so the picture's top-left corner (margin included) is its origin
  const final = draw(scale, -drawn.left, -drawn.top);
  return {
    width: drawn.width,
    height: drawn.height,
    scale,
    fontSize: labelFont(scale),
    parts: final.parts,
    grounds: final.groundSymbols,
    labels: final.labels,
    wires: final.wires,
  };
}

/** A wire from a pin to a point, in right-angle steps like the bench's wires: straight out of the pin, across, in. */
export function steppedWire(a: { x: number; y: number; side: Side }, b: { x: number; y: number }): string {
  if (a.side === "left" || a.side === "right") {
    const mid = (a.x + b.x) / 2;
    return `M${a.x} ${a.y}H${mid}V${b.y}H${b.x}`;
  }
  const mid = (a.y + b.y) / 2;
  return `M${a.x} ${a.y}V${mid}H${b.x}V${b.y}`;
}
