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

export function loadPlotly(): Promise<PlotlyModule> {
  loading ??= import("plotly.js-dist-min").then((m) => (m.default ?? m) as PlotlyModule);
  return loading;
}
