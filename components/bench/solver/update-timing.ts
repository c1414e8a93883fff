/**
 * Timing of "a value changed → the plots show it": a performance mark when the bench sends a changed circuit to
 * the solver, a measure when the magnitude plot has drawn that generation's result. The last
 * UPDATE_TIMINGS_KEPT durations (ms) are kept on `window.__benchUpdateDurations` so a browser test can read them.
 */

export const UPDATE_TIMINGS_KEPT = 20;

declare global {
  interface Window {
    __benchUpdateDurations?: number[];
  }
}

const markName = (generation: number) => `bench:change:${generation}`;
const measured = new Set<number>();

export function noteChange(generation: number): void {
  if (typeof performance === "undefined") return;
  performance.mark(markName(generation));
}

/** Called once a plot has drawn `generation`; only the first plot to do so is measured. */
export function notePlotted(generation: number): void {
  if (typeof window === "undefined" || measured.has(generation)) return;
  if (performance.getEntriesByName(markName(generation), "mark").length === 0) return;
  measured.add(generation);
  const measure = performance.measure(`bench:update:${generation}`, markName(generation));
  window.__benchUpdateDurations ??= [];
  const list = window.__benchUpdateDurations;
  list.push(measure.duration);
  if (list.length > UPDATE_TIMINGS_KEPT) list.splice(0, list.length - UPDATE_TIMINGS_KEPT);
  performance.clearMarks(markName(generation));
  performance.clearMeasures(`bench:update:${generation}`);
}
