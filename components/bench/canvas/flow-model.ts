/**
 * The bench document as React Flow sees it: one node per part, ground symbol and net label, one edge per wire.
 * Node ids carry their type ("p:R1", "g:g1", "l:n1") so a handle maps back to a document endpoint.
 */
import type { Edge, Node } from "@xyflow/react";
import type { SimErrorJson } from "@/sim/errors";
import { GROUND } from "@/sim/circuit/types";
import type { BenchPart, RawValue } from "../document/circuit";
import type { BenchDocument } from "../document/document";
import { groundFootprint, labelFootprint, type Rect } from "../document/free-spot";
import { labelWidths } from "../document/label-room";
import type { Endpoint, Placement } from "../document/layout";
import type { ItemRef, Selection } from "../store/selection";
import { keyValueText } from "../symbols/key-value";
import { rotatedSize } from "../symbols/pin-layout";
import { type RoutedWire, svgPath } from "../wiring/orthogonal-router";

export const GROUND_HANDLE = "gnd";
export const LABEL_HANDLE = "net";
/** Where the ground symbol's pin sits in its 40 × 40 node (top centre), and where a net label's (left middle). */
export const GROUND_PIN_OFFSET = { x: 20, y: 0 };
export const LABEL_PIN_OFFSET = { x: 0, y: 12 };

export interface PartNodeData extends Record<string, unknown> {
  part: BenchPart;
  placement: Placement;
  keyText: string;
  /** null, or the width the designator and value are cut back to where a neighbour leaves no room (label-room.ts) */
  labelWidth: number | null;
  error: string | null;
}
export interface GroundNodeData extends Record<string, unknown> {
  error: string | null;
}
export interface LabelNodeData extends Record<string, unknown> {
  net: string;
  error: string | null;
}

export interface WireEdgeData extends Record<string, unknown> {
  net: string | undefined;
  /** the routed SVG path in canvas units ("" when the wire has no route yet) */
  path: string;
  /** false when the router found no clear way and drew the stepped fallback */
  routed: boolean;
}
export type WireFlowEdge = Edge<WireEdgeData, "wire">;

export type PartFlowNode = Node<PartNodeData, "part">;
export type GroundFlowNode = Node<GroundNodeData, "ground">;
export type LabelFlowNode = Node<LabelNodeData, "netLabel">;
export type BenchFlowNode = PartFlowNode | GroundFlowNode | LabelFlowNode;

export function nodeIdOf(item: ItemRef): string {
  return `${item.kind === "part" ? "p" : item.kind === "ground" ? "g" : "l"}:${item.id}`;
}

export function itemOfNodeId(nodeId: string): ItemRef | null {
  const id = nodeId.slice(2);
  if (nodeId.startsWith("p:")) return { kind: "part", id };
  if (nodeId.startsWith("g:")) return { kind: "ground", id };
  if (nodeId.startsWith("l:")) return { kind: "label", id };
  return null;
}

export function endpointOfHandle(nodeId: string, handleId: string | null | undefined): Endpoint | null {
  const item = itemOfNodeId(nodeId);
  if (!item) return null;
  if (item.kind === "part") return handleId ? { kind: "pin", part: item.id, pin: handleId } : null;
  return item.kind === "ground" ? { kind: "ground", id: item.id } : { kind: "label", id: item.id };
}

export function handleOfEndpoint(endpoint: Endpoint): { node: string; handle: string } {
  if (endpoint.kind === "pin") return { node: `p:${endpoint.part}`, handle: endpoint.pin };
  if (endpoint.kind === "ground") return { node: `g:${endpoint.id}`, handle: GROUND_HANDLE };
  return { node: `l:${endpoint.id}`, handle: LABEL_HANDLE };
}

/** The net a wire belongs to, from the circuit's pins (for error highlighting and titles). */
export function netOfEndpoint(document: BenchDocument, endpoint: Endpoint): string | undefined {
  if (endpoint.kind === "ground") return GROUND;
  if (endpoint.kind === "label") return document.layout.netLabels[endpoint.id]?.net;
  return document.circuit.parts.find((p) => p.id === endpoint.part)?.pins[endpoint.pin];
}

/** Every drawn item's box without the text under a part: what a part's label must keep clear of. */
function itemBoxes(document: BenchDocument, parts: readonly { part: BenchPart; placement: Placement }[]): Rect[] {
  return [
    ...parts.map(({ part, placement }) => ({
      x: placement.x,
      y: placement.y,
      ...rotatedSize(part.kind, placement.rotation),
    })),
    ...Object.values(document.layout.grounds).map(groundFootprint),
    ...Object.values(document.layout.netLabels).map((l) => labelFootprint(l.net, l)),
  ];
}

export function toFlowNodes(
  document: BenchDocument,
  selection: Selection,
  error: SimErrorJson | null,
  parameters: Record<string, RawValue>,
): BenchFlowNode[] {
  const selectedParts = new Set(selection.parts);
  const selectedGrounds = new Set(selection.grounds);
  const selectedLabels = new Set(selection.labels);
  const nodes: BenchFlowNode[] = [];
  const labelled = document.circuit.parts.map((part) => ({
    part,
    placement: document.layout.parts[part.id] ?? { x: 0, y: 0, rotation: 0 },
    keyText: keyValueText(part, parameters),
  }));
  const widths = labelWidths(labelled, itemBoxes(document, labelled));
  for (const { part, placement, keyText } of labelled) {
    nodes.push({
      id: `p:${part.id}`,
      type: "part",
      position: { x: placement.x, y: placement.y },
      selected: selectedParts.has(part.id),
      ariaLabel: `${part.id}, ${part.kind}`,
      data: {
        part,
        placement,
        keyText,
        labelWidth: widths.get(part.id) ?? null,
        error: error?.part === part.id ? error.message : null,
      },
    });
  }
  for (const [id, at] of Object.entries(document.layout.grounds)) {
    nodes.push({
      id: `g:${id}`,
      type: "ground",
      position: at,
      selected: selectedGrounds.has(id),
      ariaLabel: "ground",
      data: { error: error?.net === GROUND ? error.message : null },
    });
  }
  for (const [id, label] of Object.entries(document.layout.netLabels)) {
    nodes.push({
      id: `l:${id}`,
      type: "netLabel",
      position: { x: label.x, y: label.y },
      selected: selectedLabels.has(id),
      ariaLabel: `net label ${label.net}`,
      data: { net: label.net, error: error?.net === label.net ? error.message : null },
    });
  }
  return nodes;
}

export function toFlowEdges(
  document: BenchDocument,
  selection: Selection,
  error: SimErrorJson | null,
  routes: ReadonlyMap<string, RoutedWire>,
): WireFlowEdge[] {
  const selected = new Set(selection.wires);
  return document.layout.wires.map((wire) => {
    const from = handleOfEndpoint(wire.from);
    const to = handleOfEndpoint(wire.to);
    const net = netOfEndpoint(document, wire.from) ?? netOfEndpoint(document, wire.to);
    const faulty = error?.net !== undefined && error.net === net;
    const route = routes.get(wire.id);
    return {
      id: wire.id,
      source: from.node,
      sourceHandle: from.handle,
      target: to.node,
      targetHandle: to.handle,
      type: "wire",
      selected: selected.has(wire.id),
      className: faulty ? "bench-wire bench-wire-fault" : "bench-wire",
      data: { net, path: route ? svgPath(route.points) : "", routed: route?.routed ?? false },
      ariaLabel: net === undefined ? "wire" : `wire on net ${net}`,
      // the two items it joins, for tests and tools that read the drawing from the page (React Flow's type for
      // these attributes lists only the SVG ones, not data-*)
      domAttributes: { "data-from": from.node, "data-to": to.node } as WireFlowEdge["domAttributes"],
    };
  });
}

const sameRecord = (a: Record<string, unknown>, b: Record<string, unknown>) => {
  const keys = Object.keys(a);
  return keys.length === Object.keys(b).length && keys.every((k) => a[k] === b[k]);
};

/** Same id, type, place, selection, label and data (each data field by identity): the node draws the same. */
function sameNode(a: BenchFlowNode, b: BenchFlowNode): boolean {
  return (
    a.type === b.type &&
    a.position.x === b.position.x &&
    a.position.y === b.position.y &&
    a.selected === b.selected &&
    a.ariaLabel === b.ariaLabel &&
    sameRecord(a.data, b.data)
  );
}

function sameEdge(a: WireFlowEdge, b: WireFlowEdge): boolean {
  return (
    a.source === b.source &&
    a.sourceHandle === b.sourceHandle &&
    a.target === b.target &&
    a.targetHandle === b.targetHandle &&
    a.selected === b.selected &&
    a.className === b.className &&
    a.ariaLabel === b.ariaLabel &&
    a.data?.net === b.data?.net &&
    a.data?.path === b.data?.path
  );
}

/**
 * `next` with every item that draws the same as in `previous` replaced by the previous object, so a value change
 * re-renders (and React Flow re-measures) only the nodes and wires it touched, not the whole drawing.
 */
function keepUnchanged<T extends { id: string }>(
  previous: readonly T[],
  next: T[],
  same: (a: T, b: T) => boolean,
): T[] {
  const before = new Map(previous.map((item) => [item.id, item]));
  return next.map((item) => {
    const old = before.get(item.id);
    return old && same(old, item) ? old : item;
  });
}

export const keepUnchangedNodes = (previous: readonly BenchFlowNode[], next: BenchFlowNode[]) =>
  keepUnchanged(previous, next, sameNode);
export const keepUnchangedEdges = (previous: readonly WireFlowEdge[], next: WireFlowEdge[]) =>
  keepUnchanged(previous, next, sameEdge);
