/**
 * What the wire router needs from the bench: every drawn item's box (with the designator and value under a part)
 * and each wire's two ends (pin point, the side it faces, its item). Built from the canvas's nodes, whose part
 * value text is already formatted, so building it parses nothing. `sceneKey` says when two scenes route alike: a
 * value edit or a selection leaves the key, and so the routes, as they were.
 */
import type { BenchDocument } from "../document/document";
import { groundFootprint, labelFootprint, partLabelRect } from "../document/free-spot";
import { GRID, type Endpoint } from "../document/layout";
import { labelLeft, widthUnderSymbol } from "../symbols/label-place";
import { rotatedPinOffset, rotatedSide, rotatedSize, SYMBOL_BOXES } from "../symbols/pin-layout";
import type { Obstacle, Point, WireEnd, WireRequest } from "../wiring/orthogonal-router";
import {
  type BenchFlowNode,
  GROUND_PIN_OFFSET,
  handleOfEndpoint,
  LABEL_PIN_OFFSET,
  netOfEndpoint,
  type PartFlowNode,
} from "./flow-model";

export interface WireScene {
  obstacles: Obstacle[];
  wires: WireRequest[];
  /** the pins no wire reaches yet, which no route may pass through */
  freePins: Point[];
}

/**
 * A part is two boxes to keep clear of: its symbol and the text under it, so a wire may pass close beside a small
 * symbol whose label is wide. The text's box is widened to whole steps of two grids (from its left edge, or about
 * its centre when it is centred), and at least as wide as the symbol: a value edit that changes the text by a letter
 * or two keeps the box, and so every route, the same; a value whose text outgrows it re-routes what passes by.
 */
const LABEL_STEP = 2 * GRID;

/** A pin's name is 9 px monospace (part-node.tsx): about 0.6 em a letter (common practice), rounded up. */
const PIN_NAME_LETTER = 5.6;
/** The name starts this far right of an upward or downward pin (part-node.tsx PIN_NAME_OFFSET). */
const PIN_NAME_SHIFT = 4;
/** Every box the router is given is at least this big each way (more than a grid step: see the router). */
const MIN_BOX = 24;

/**
 * The name beside an upward or downward pin runs rightwards and can stick out past the symbol (a capsule's
 * "diaphragm"): that part is kept clear too, as a box one grid row deep along the pin's edge.
 */
function pinNameOverhangs(node: PartFlowNode, size: { width: number; height: number }): Obstacle[] {
  const { part, placement } = node.data;
  const boxes: Obstacle[] = [];
  for (const [pin, place] of Object.entries(SYMBOL_BOXES[part.kind].pins)) {
    const side = rotatedSide(place.side, placement.rotation);
    if (side !== "top" && side !== "bottom") continue;
    const at = rotatedPinOffset(part.kind, pin, placement.rotation);
    const right = at.x + PIN_NAME_SHIFT + PIN_NAME_LETTER * pin.length;
    if (right <= size.width) continue;
    const y = side === "top" ? at.y - 2 : at.y + 2 - MIN_BOX;
    boxes.push({
      id: node.id,
      x: placement.x + at.x,
      y: placement.y + y,
      width: Math.max(MIN_BOX, right - at.x),
      height: MIN_BOX,
    });
  }
  return boxes;
}

function partObstacles(node: PartFlowNode): Obstacle[] {
  const { part, placement, keyText, labelWidth } = node.data;
  const size = rotatedSize(part.kind, placement.rotation);
  const label = partLabelRect(part, placement, keyText);
  const left = labelLeft(part.kind, placement.rotation);
  // never narrower than the symbol above it: a short value's edit then moves nothing at all; a label cut back to
  // its room (label-room.ts) is kept at exactly that width, since rounding it up would reach into its neighbour
  const under = widthUnderSymbol(part.kind, placement.rotation);
  const width =
    labelWidth !== null
      ? Math.max(under, labelWidth)
      : Math.max(under, Math.ceil(label.width / LABEL_STEP) * LABEL_STEP);
  const x = left === null ? label.x + (label.width - width) / 2 : label.x;
  return [
    { id: node.id, x: placement.x, y: placement.y, ...size },
    { id: node.id, x, y: label.y, width, height: label.height },
    ...pinNameOverhangs(node, size),
  ];
}

function obstaclesOf(node: BenchFlowNode): Obstacle[] {
  if (node.type === "part") return partObstacles(node);
  const rect = node.type === "ground" ? groundFootprint(node.position) : labelFootprint(node.data.net, node.position);
  return [{ id: node.id, ...rect }];
}

/** Where a drawn item's pin sits on the canvas: a ground's or a net label's one pin, or a part's named pin. */
function pinPoint(node: BenchFlowNode, pin?: string): Point {
  const { x, y } = node.position;
  if (node.type === "ground") return { x: x + GROUND_PIN_OFFSET.x, y: y + GROUND_PIN_OFFSET.y };
  if (node.type === "netLabel") return { x: x + LABEL_PIN_OFFSET.x, y: y + LABEL_PIN_OFFSET.y };
  const { part, placement } = node.data;
  const offset = rotatedPinOffset(part.kind, pin as string, placement.rotation);
  return { x: placement.x + offset.x, y: placement.y + offset.y };
}

/** Every pin of a drawn item. */
function pinPoints(node: BenchFlowNode): Point[] {
  if (node.type !== "part") return [pinPoint(node)];
  return Object.keys(SYMBOL_BOXES[node.data.part.kind].pins).map((pin) => pinPoint(node, pin));
}

function wireEnd(endpoint: Endpoint, nodes: Map<string, BenchFlowNode>): WireEnd | null {
  const owner = handleOfEndpoint(endpoint).node;
  const node = nodes.get(owner);
  if (!node) return null;
  if (node.type === "ground") return { point: pinPoint(node), side: "top", owner };
  if (node.type === "netLabel") return { point: pinPoint(node), side: "left", owner };
  if (endpoint.kind !== "pin") return null;
  const { part, placement } = node.data;
  const place = SYMBOL_BOXES[part.kind].pins[endpoint.pin];
  if (!place) return null;
  return { point: pinPoint(node, endpoint.pin), side: rotatedSide(place.side, placement.rotation), owner };
}

export function wireScene(document: BenchDocument, nodes: readonly BenchFlowNode[]): WireScene {
  const byId = new Map(nodes.map((n) => [n.id, n]));
  const wires: WireRequest[] = [];
  for (const wire of document.layout.wires) {
    const from = wireEnd(wire.from, byId);
    const to = wireEnd(wire.to, byId);
    if (!from || !to) continue;
    const net = netOfEndpoint(document, wire.from) ?? netOfEndpoint(document, wire.to) ?? wire.id;
    wires.push({ id: wire.id, net, from, to });
  }
  const wired = new Set(wires.flatMap((w) => [pointKey(w.from.point), pointKey(w.to.point)]));
  const freePins = nodes.flatMap(pinPoints).filter((p) => !wired.has(pointKey(p)));
  return { obstacles: nodes.flatMap(obstaclesOf), wires, freePins };
}

const pointKey = (p: Point) => `${p.x},${p.y}`;

/** A string equal for two scenes exactly when they route the same. */
export function sceneKey(scene: WireScene): string {
  const end = (e: WireEnd) => `${e.point.x},${e.point.y},${e.side},${e.owner}`;
  return [
    ...scene.obstacles.map((o) => `${o.id}:${o.x},${o.y},${o.width},${o.height}`),
    ...scene.wires.map((w) => `${w.id}:${w.net}:${end(w.from)}:${end(w.to)}`),
    scene.freePins.map(pointKey).join(";"),
  ].join("|");
}
