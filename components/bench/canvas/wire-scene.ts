/**
 * What the wire router needs from the bench: every drawn item's box (with the designator and value under a part)
 * and each wire's two ends (pin point, the side it faces, its item). Built from the canvas's nodes, whose part
 * value text is already formatted, so building it parses nothing. `sceneKey` says when two scenes route alike: a
 * value edit or a selection leaves the key, and so the routes, as they were.
 */
import type { BenchDocument } from "../document/document";
import { groundFootprint, labelFootprint, partFootprintWithText } from "../document/free-spot";
import { GRID, type Endpoint } from "../document/layout";
import { rotatedPinOffset, rotatedSide, SYMBOL_BOXES } from "../symbols/pin-layout";
import type { Obstacle, WireEnd, WireRequest } from "../wiring/orthogonal-router";
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
}

/**
 * The label under a part, widened to whole steps of two grids about the part's centre: a value edit that changes
 * the text by a letter or two keeps the box (and so every route) the same, and the box stays symmetric.
 */
const LABEL_STEP = 2 * GRID;

function partObstacle(node: PartFlowNode): Obstacle {
  const { part, placement, keyText } = node.data;
  const rect = partFootprintWithText(part, placement, keyText);
  const centre = rect.x + rect.width / 2;
  const width = Math.ceil(rect.width / LABEL_STEP) * LABEL_STEP;
  return { id: node.id, x: centre - width / 2, y: rect.y, width, height: rect.height };
}

function obstacleOf(node: BenchFlowNode): Obstacle {
  if (node.type === "part") return partObstacle(node);
  const rect = node.type === "ground" ? groundFootprint(node.position) : labelFootprint(node.data.net, node.position);
  return { id: node.id, ...rect };
}

function wireEnd(endpoint: Endpoint, nodes: Map<string, BenchFlowNode>): WireEnd | null {
  const owner = handleOfEndpoint(endpoint).node;
  const node = nodes.get(owner);
  if (!node) return null;
  if (node.type === "ground") {
    const { x, y } = node.position;
    return { point: { x: x + GROUND_PIN_OFFSET.x, y: y + GROUND_PIN_OFFSET.y }, side: "top", owner };
  }
  if (node.type === "netLabel") {
    const { x, y } = node.position;
    return { point: { x: x + LABEL_PIN_OFFSET.x, y: y + LABEL_PIN_OFFSET.y }, side: "left", owner };
  }
  if (endpoint.kind !== "pin") return null;
  const { part, placement } = node.data;
  const place = SYMBOL_BOXES[part.kind].pins[endpoint.pin];
  if (!place) return null;
  const offset = rotatedPinOffset(part.kind, endpoint.pin, placement.rotation);
  return {
    point: { x: placement.x + offset.x, y: placement.y + offset.y },
    side: rotatedSide(place.side, placement.rotation),
    owner,
  };
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
  return { obstacles: nodes.map(obstacleOf), wires };
}

/** A string equal for two scenes exactly when they route the same. */
export function sceneKey(scene: WireScene): string {
  const end = (e: WireEnd) => `${e.point.x},${e.point.y},${e.side},${e.owner}`;
  return [
    ...scene.obstacles.map((o) => `${o.id}:${o.x},${o.y},${o.width},${o.height}`),
    ...scene.wires.map((w) => `${w.id}:${w.net}:${end(w.from)}:${end(w.to)}`),
  ].join("|");
}
