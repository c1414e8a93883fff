/**
 * The box the whole drawing takes on the canvas: every item with what is drawn outside it (a part's designator and
 * value, a pin name sticking out) and every wire's route, which can run outside all the items. React Flow's own
 * fit sees the nodes' boxes only, so a wire looping round the outside or a wide label at the edge was cut off by a
 * fitted view; the bench fits this box instead.
 */
import type { Rect } from "../document/free-spot";
import type { RoutedWire } from "../wiring/orthogonal-router";

/** The smallest box holding every rect and every route's corners; null for an empty drawing. */
export function drawingBounds(items: readonly Rect[], routes: ReadonlyMap<string, RoutedWire>): Rect | null {
  let left = Number.POSITIVE_INFINITY;
  let top = Number.POSITIVE_INFINITY;
  let right = Number.NEGATIVE_INFINITY;
  let bottom = Number.NEGATIVE_INFINITY;
  const take = (x0: number, y0: number, x1: number, y1: number) => {
    left = Math.min(left, x0);
    top = Math.min(top, y0);
    right = Math.max(right, x1);
    bottom = Math.max(bottom, y1);
  };
  for (const r of items) take(r.x, r.y, r.x + r.width, r.y + r.height);
  for (const route of routes.values()) for (const p of route.points) take(p.x, p.y, p.x, p.y);
  return left <= right ? { x: left, y: top, width: right - left, height: bottom - top } : null;
}
