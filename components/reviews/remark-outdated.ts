/**
 * Whether a remark made on one revision is outdated on a later one: its part changed (kind, values, pins, tolerance,
 * on/off — components/designs/circuit-diff.ts) or is gone; for a net, a part on that net changed or the net is gone.
 * Frequency ranges and figures are about the response as a whole and stay current. Pure.
 */
import { diffCircuits } from "@/components/designs/circuit-diff";
import type { RemarkAnchor } from "@/components/schemas/review";

type Loose = Record<string, unknown>;

function netsOf(circuit: unknown): Map<string, Set<string>> {
  const map = new Map<string, Set<string>>();
  const parts = (circuit as Loose | null)?.parts;
  if (!Array.isArray(parts)) return map;
  for (const part of parts as Loose[]) {
    const pins = part?.pins;
    if (!pins || typeof pins !== "object") continue;
    for (const net of Object.values(pins as Loose)) {
      const name = String(net);
      if (!map.has(name)) map.set(name, new Set());
      map.get(name)?.add(String(part.id));
    }
  }
  return map;
}

export function isRemarkOutdated(anchor: RemarkAnchor, madeOn: unknown, current: unknown): boolean {
  if (anchor.type === "frequency" || anchor.type === "figure") return false;
  const diff = diffCircuits(madeOn, current);
  const touched = new Set([...diff.partsChanged.map((p) => p.id), ...diff.partsRemoved.map((p) => p.id)]);
  if (anchor.type === "part") return touched.has(anchor.part);
  const before = netsOf(madeOn).get(anchor.net);
  const after = netsOf(current).get(anchor.net);
  if (!after) return Boolean(before);
  return [...(before ?? [])].some((id) => touched.has(id)) || [...after].some((id) => !before?.has(id));
}

/** A remark's anchor as words: "part J1", "net out", "20 Hz – 200 Hz", "figure low_corner_hz". */
export function anchorLabel(anchor: RemarkAnchor): string {
  switch (anchor.type) {
    case "part":
      return `Part ${anchor.part}`;
    case "net":
      return `Net ${anchor.net}`;
    case "frequency":
      return `${formatHz(anchor.fromHz)} – ${formatHz(anchor.toHz)}`;
    case "figure":
      return `Figure ${anchor.figure}`;
  }
}

function formatHz(hz: number): string {
  return hz >= 1000 ? `${Number((hz / 1000).toPrecision(4))} kHz` : `${Number(hz.toPrecision(4))} Hz`;
}

/** The bench's address for an anchor (the bench reads ?part=, ?net=, ?from=&to=, ?figure=). */
export function anchorQuery(anchor: RemarkAnchor): string {
  switch (anchor.type) {
    case "part":
      return `?part=${encodeURIComponent(anchor.part)}`;
    case "net":
      return `?net=${encodeURIComponent(anchor.net)}`;
    case "frequency":
      return `?from=${anchor.fromHz}&to=${anchor.toHz}`;
    case "figure":
      return `?figure=${encodeURIComponent(anchor.figure)}`;
  }
}

/** Groups threads under one key per anchor (part J1, net out, …), in the order first seen. */
export function anchorKey(anchor: RemarkAnchor): string {
  switch (anchor.type) {
    case "part":
      return `part:${anchor.part}`;
    case "net":
      return `net:${anchor.net}`;
    case "frequency":
      return `frequency:${anchor.fromHz}-${anchor.toHz}`;
    case "figure":
      return `figure:${anchor.figure}`;
  }
}
