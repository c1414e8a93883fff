/**
 * Timing of "a value changed → the plots show it", in stages, so `npm run bench:ui` can say where the time goes:
 *   edit     the live solve took the changed circuit (noteChange: from the store's subscription on the bench, so
 *            before React renders the edit; else in a layout effect, after it)
 *   sent     the live solve posted that circuit to the worker
 *   solved   the worker's answer is back on the main thread
 *   rendered React committed the plots panel with that result; Plotly is about to draw
 *   plotted  Plotly has drawn it in the magnitude plot (the measure that counts)
 * A performance mark `bench:change:<generation>` starts at the edit and a measure ends when the plot has drawn.
 * The last UPDATE_TIMINGS_KEPT durations (ms) are kept on `window.__benchUpdateDurations` for a browser test;
 * `window.__benchSolveDurations` keeps the edit → solved part, `window.__benchUpdateStages` each stage's share.
 */

export const UPDATE_TIMINGS_KEPT = 20;

export interface UpdateStages {
  /** edit → posted to the worker (React render of the edit, the effect) */
  toSend: number;
  /** posted → answer back on the main thread (clone, solve, clone, waiting for the main thread) */
  solve: number;
  /** of which the engine inside the worker */
  engine: number;
  /** answer back → Plotly starts drawing (React render and commit of the result) */
  render: number;
  /** Plotly.react on the magnitude plot */
  plot: number;
  total: number;
}

declare global {
  interface Window {
    __benchUpdateDurations?: number[];
    __benchSolveDurations?: number[];
    __benchUpdateStages?: UpdateStages[];
  }
}

type Stage = "sent" | "solved" | "rendered";

const markName = (generation: number) => `bench:change:${generation}`;
const measured = new Set<number>();
const stages = new Map<number, Partial<Record<Stage | "engine", number>>>();
const inBrowser = () => typeof window !== "undefined" && typeof performance !== "undefined";

/** The live solve took a changed circuit as `generation`. */
export function noteChange(generation: number): void {
  if (!inBrowser()) return;
  performance.mark(markName(generation));
  stages.set(generation, {});
}

export function noteStage(generation: number, stage: Stage): void {
  if (!inBrowser()) return;
  const entry = stages.get(generation);
  if (entry && entry[stage] === undefined) entry[stage] = performance.now();
}

function keep<T>(list: T[], value: T): void {
  list.push(value);
  if (list.length > UPDATE_TIMINGS_KEPT) list.splice(0, list.length - UPDATE_TIMINGS_KEPT);
}

/** Called when `generation`'s result is back from the solver, with the engine's own time in the worker. */
export function noteSolved(generation: number, engineMs?: number): void {
  if (!inBrowser()) return;
  noteStage(generation, "solved");
  const entry = stages.get(generation);
  if (entry && engineMs !== undefined) entry.engine = engineMs;
  const mark = performance.getEntriesByName(markName(generation), "mark")[0];
  if (!mark) return;
  window.__benchSolveDurations ??= [];
  keep(window.__benchSolveDurations, performance.now() - mark.startTime);
}

/** Called once a plot has drawn `generation`; only the first plot to do so is measured. */
export function notePlotted(generation: number): void {
  if (!inBrowser() || measured.has(generation)) return;
  const mark = performance.getEntriesByName(markName(generation), "mark")[0];
  if (!mark) return;
  measured.add(generation);
  const measure = performance.measure(`bench:update:${generation}`, markName(generation));
  window.__benchUpdateDurations ??= [];
  keep(window.__benchUpdateDurations, measure.duration);
  const s = stages.get(generation) ?? {};
  const now = performance.now();
  const sent = s.sent ?? mark.startTime;
  const solved = s.solved ?? sent;
  const rendered = s.rendered ?? solved;
  window.__benchUpdateStages ??= [];
  keep(window.__benchUpdateStages, {
    toSend: sent - mark.startTime,
    solve: solved - sent,
    engine: s.engine ?? Number.NaN,
    render: rendered - solved,
    plot: now - rendered,
    total: measure.duration,
  });
  // generations the newest one overtook are never plotted: forget them too
  for (const g of stages.keys()) if (g <= generation) stages.delete(g);
  performance.clearMarks(markName(generation));
  performance.clearMeasures(`bench:update:${generation}`);
}
