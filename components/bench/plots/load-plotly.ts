/**
 * Plotly, loaded once and only when a bench plot mounts (a separate chunk: the landing page never downloads it).
 * The few functions the bench calls, typed here because the package ships no types.
 */
export interface PlotlyModule {
  react(div: HTMLElement, data: unknown[], layout: unknown, config?: unknown): Promise<unknown>;
  purge(div: HTMLElement): void;
  downloadImage(
    div: HTMLElement,
    options: { format: "png"; filename: string; width?: number; height?: number },
  ): Promise<string>;
  toImage(div: HTMLElement, options: { format: "png"; width?: number; height?: number }): Promise<string>;
}

let loading: Promise<PlotlyModule> | null = null;
let loaded: PlotlyModule | null = null;

export function loadPlotly(): Promise<PlotlyModule> {
  loading ??= import("plotly.js-dist-min").then((m) => {
    loaded = (m.default ?? m) as PlotlyModule;
    return loaded;
  });
  return loading;
}

/** Plotly when it has loaded (so an update can draw in the same task as React's commit), else null. */
export function plotlyIfLoaded(): PlotlyModule | null {
  return loaded;
}
