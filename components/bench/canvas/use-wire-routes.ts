"use client";
/**
 * The routes of every wire for the drawn nodes, re-routed only when something a route depends on moved: an item's
 * place or box, a wire's ends or its net. A value edit, a selection or a caution mark keep the scene's key, and so
 * the very same routes (and, through keepUnchangedEdges, the same edge objects). Routing the demo circuit's 24
 * wires takes well under a millisecond, so a drag re-routes everything each frame. Also gives the box the whole
 * drawing takes (drawing-bounds.ts), wires included, for fitting the view.
 */
import { useMemo, useRef } from "react";
import type { BenchDocument } from "../document/document";
import { type RoutedWire, routeWires } from "../wiring/orthogonal-router";
import type { Rect } from "../document/free-spot";
import { drawingBounds } from "./drawing-bounds";
import type { BenchFlowNode } from "./flow-model";
import { sceneKey, wireScene } from "./wire-scene";

export interface WireRoutes {
  routes: ReadonlyMap<string, RoutedWire>;
  /** the whole drawing's box, items and wires; null when nothing is drawn */
  bounds: Rect | null;
}

export function useWireRoutes(document: BenchDocument, nodes: readonly BenchFlowNode[]): WireRoutes {
  const last = useRef<{ key: string; routed: WireRoutes } | null>(null);
  return useMemo(() => {
    const scene = wireScene(document, nodes);
    const key = sceneKey(scene);
    if (last.current?.key !== key) {
      const routes = routeWires(scene.obstacles, scene.wires, undefined, scene.freePins);
      last.current = { key, routed: { routes, bounds: drawingBounds(scene.obstacles, routes) } };
    }
    return last.current.routed;
  }, [document, nodes]);
}
