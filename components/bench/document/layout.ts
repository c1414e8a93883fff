/**
 * The bench's drawing of a circuit, stored beside the circuit file in a revision (`layout`). The circuit says which
 * pins share a net; the layout says where each part sits and which wires, ground symbols and net labels make those
 * nets on the canvas. Coordinates are canvas units (px at zoom 1); rotation is in degrees, clockwise.
 */

export const LAYOUT_VERSION = 1;

export type Rotation = 0 | 90 | 180 | 270;

export interface Placement {
  x: number;
  y: number;
  rotation: Rotation;
}

/** A point a wire can end on: a part's pin, a ground symbol or a net label. */
export type Endpoint =
  | { kind: "pin"; part: string; pin: string }
  | { kind: "ground"; id: string }
  | { kind: "label"; id: string };

export interface Wire {
  id: string;
  from: Endpoint;
  to: Endpoint;
}

export interface NetLabel {
  x: number;
  y: number;
  /** the net this label names; every label on one net carries the same name */
  net: string;
}

/** A note pinned to a part or a net, shown as a callout. */
export interface LayoutNote {
  id: string;
  text: string;
  part?: string;
  net?: string;
}

export interface BenchLayout {
  version: typeof LAYOUT_VERSION;
  parts: Record<string, Placement>;
  /** ground symbols: each joins whatever it is wired to with net "0" */
  grounds: Record<string, { x: number; y: number }>;
  netLabels: Record<string, NetLabel>;
  wires: Wire[];
  notes: LayoutNote[];
}

/** Snap spacing of the canvas grid, canvas units. */
export const GRID = 20;

export function emptyLayout(): BenchLayout {
  return { version: LAYOUT_VERSION, parts: {}, grounds: {}, netLabels: {}, wires: [], notes: [] };
}

const ROTATIONS: readonly Rotation[] = [0, 90, 180, 270];

export function isRotation(value: unknown): value is Rotation {
  return ROTATIONS.includes(value as Rotation);
}

/** A stable string for an endpoint (for sets and maps). */
export function endpointKey(endpoint: Endpoint): string {
  if (endpoint.kind === "pin") return `pin:${endpoint.part}\u0000${endpoint.pin}`;
  return `${endpoint.kind}:${endpoint.id}`;
}

export function sameEndpoint(a: Endpoint, b: Endpoint): boolean {
  return endpointKey(a) === endpointKey(b);
}

function isEndpoint(value: unknown): value is Endpoint {
  const v = value as Record<string, unknown> | null;
  if (!v || typeof v !== "object") return false;
  if (v.kind === "pin") return typeof v.part === "string" && typeof v.pin === "string";
  return (v.kind === "ground" || v.kind === "label") && typeof v.id === "string";
}

const finite = (value: unknown, fallback = 0) =>
  typeof value === "number" && Number.isFinite(value) ? value : fallback;

/**
 * Reads a stored layout, dropping whatever is malformed (a layout is a drawing; a damaged one must never stop the
 * circuit from opening). Returns null when there is no usable layout at all, so the caller lays the circuit out.
 */
export function readLayout(stored: unknown): BenchLayout | null {
  const raw = stored as Record<string, unknown> | null;
  if (!raw || typeof raw !== "object" || !raw.parts || typeof raw.parts !== "object") return null;
  const layout = emptyLayout();
  for (const [id, p] of Object.entries(raw.parts as Record<string, Record<string, unknown>>)) {
    if (!p || typeof p !== "object") continue;
    layout.parts[id] = { x: finite(p.x), y: finite(p.y), rotation: isRotation(p.rotation) ? p.rotation : 0 };
  }
  for (const [id, g] of Object.entries((raw.grounds ?? {}) as Record<string, Record<string, unknown>>)) {
    if (g && typeof g === "object") layout.grounds[id] = { x: finite(g.x), y: finite(g.y) };
  }
  for (const [id, l] of Object.entries((raw.netLabels ?? {}) as Record<string, Record<string, unknown>>)) {
    if (l && typeof l === "object" && typeof l.net === "string" && l.net !== "") {
      layout.netLabels[id] = { x: finite(l.x), y: finite(l.y), net: l.net };
    }
  }
  if (Array.isArray(raw.wires)) {
    for (const w of raw.wires as Record<string, unknown>[]) {
      if (w && typeof w.id === "string" && isEndpoint(w.from) && isEndpoint(w.to)) {
        layout.wires.push({ id: w.id, from: w.from, to: w.to });
      }
    }
  }
  if (Array.isArray(raw.notes)) {
    for (const n of raw.notes as Record<string, unknown>[]) {
      if (n && typeof n.id === "string" && typeof n.text === "string") {
        layout.notes.push({
          id: n.id,
          text: n.text,
          ...(typeof n.part === "string" && { part: n.part }),
          ...(typeof n.net === "string" && { net: n.net }),
        });
      }
    }
  }
  return layout;
}
