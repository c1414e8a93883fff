/**
 * The flow coordinates of the middle of the visible canvas: where a part clicked in the tray (or a ground or label
 * added by key) appears. The canvas element is found by its data attribute, so the tray needs no ref to it.
 */
import type { ReactFlowInstance } from "@xyflow/react";

export const CANVAS_ATTRIBUTE = "data-bench-canvas";

export function canvasCentre(flow: Pick<ReactFlowInstance, "screenToFlowPosition">): { x: number; y: number } {
  const element = typeof document === "undefined" ? null : document.querySelector(`[${CANVAS_ATTRIBUTE}]`);
  if (!element) return { x: 0, y: 0 };
  const rect = element.getBoundingClientRect();
  return flow.screenToFlowPosition({ x: rect.left + rect.width / 2, y: rect.top + rect.height / 2 });
}

/** The drag-and-drop type a tray item carries. */
export const KIND_DRAG_TYPE = "application/x-backplate-kind";

/** Asks the part sheet to take focus (Enter on a part, double-click). */
export const FOCUS_SHEET_EVENT = "backplate:focus-part-sheet";
