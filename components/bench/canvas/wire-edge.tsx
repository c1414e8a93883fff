"use client";
/**
 * A wire on the canvas: the routed path (horizontal and vertical runs round every other item, see
 * wiring/orthogonal-router.ts) carried in the edge's data. Until a route exists (the first frame after a wire is
 * drawn) it is a straight line between the handles React Flow measured.
 */
import { BaseEdge, type EdgeProps } from "@xyflow/react";
import { memo } from "react";
import type { WireFlowEdge } from "./flow-model";

/** Wide enough to click a 1.6 px wire easily, narrow enough not to catch its neighbour a grid away. */
const CLICK_WIDTH = 12;

function WireEdgeView({ id, data, sourceX, sourceY, targetX, targetY }: EdgeProps<WireFlowEdge>) {
  const path = data?.path || `M ${sourceX} ${sourceY} L ${targetX} ${targetY}`;
  return <BaseEdge id={id} path={path} interactionWidth={CLICK_WIDTH} data-routed={data?.routed ? "yes" : "no"} />;
}

export const WireEdge = memo(WireEdgeView);
