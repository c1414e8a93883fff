"use client";
/**
 * The routes of every wire for the drawn nodes, re-routed only when something a route depends on moved: an item's
 * place or box, a wire's ends or its net. A value edit, a selection or a caution mark keep the scene's key, and so
 * the very same routes (and, through keepUnchangedEdges, the same edge objects). Routing the demo circuit's 24
 * wires takes well under a millisecond, so a drag re-routes everything each frame.
 */
import { useMemo, useRef } from "react";
import type { BenchDocument } from "../document/document";
import { type RoutedWire, routeWires } from "../wiring/orthogonal-router";
import type { BenchFlowNode } from "./flow-model";
import { sceneKey, wireScene } from "./wire-scene";

export function useWireRoutes(
  document: BenchDocument,
  nodes: readonly BenchFlowNode[],
): ReadonlyMap<string, RoutedWire> {
  const last = useRef<{ key: string; routes: ReadonlyMap<string, RoutedWire> } | null>(null);
  return useMemo(() => {
    const scene = wireScene(document, nodes);
    const key = sceneKey(scene);
    if (last.current?.key !== key) last.current = { key, routes: routeWires(scene.obstacles, scene.wires) };
    return last.current.routes;
  }, [document, nodes]);
}
