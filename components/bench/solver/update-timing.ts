/**
 * Timing of "a value changed → the plots show it": a performance mark when the bench sends a changed circuit to
 * the solver, a measure when the magnitude plot has drawn that generation's result. The last
 * UPDATE_TIMINGS_KEPT durations (ms) are kept on `window.__benchUpdateDurations` so a browser test can read them;
 * `window.__benchSolveDurations` keeps the part of each that the solver took (change → result back on the page).
 */

export const UPDATE_TIMINGS_KEPT = 20;

declare global {
  interface Window {
    __benchUpdateDurations?: number[];
    __benchSolveDurations?: number[];
  }
}

const markName = (generation: number) => `bench:change:${generation}`;
const measured = new Set<number>();

export function noteChange(generation: number): void {
  if (typeof performance === "undefined") return;
  performance.mark(markName(generation));
}

function keep(list: number[], value: number): void {
  list.push(value);
  if (list.length > UPDATE_TIMINGS_KEPT) list.splice(0, list.length - UPDATE_TIMINGS_KEPT);
}

/** Called when `generation`'s result is back from the solver. */
export function noteSolved(generation: number): void {
  if (typeof window === "undefined") return;
  const mark = performance.getEntriesByName(markName(generation), "mark")[0];
  if (!mark) return;
  window.__benchSolveDurations ??= [];
  keep(window.__benchSolveDurations, performance.now() - mark.startTime);
}

/** Called once a plot has drawn `generation`; only the first plot to do so is measured. */
export function notePlotted(generation: number): void {
  if (typeof window === "undefined" || measured.has(generation)) return;
  if (performance.getEntriesByName(markName(generation), "mark").length === 0) return;
  measured.add(generation);
  const measure = performance.measure(`bench:update:${generation}`, markName(generation));
  window.__benchUpdateDurations ??= [];
  keep(window.__benchUpdateDurations, measure.duration);
  performance.clearMarks(markName(generation));
  performance.clearMeasures(`bench:update:${generation}`);
}
