"use client";
/**
 * The bench's one Plotly wrapper: creates the plot once, updates it in place with Plotly.react on every change
 * (never re-created, so an update costs only the redraw), purges it on unmount. Once Plotly has loaded, an update
 * draws in a layout effect, in the same task as React's commit, so a new result reaches the screen in the frame
 * that shows it (a passive effect would wait for the next paint). `onDrawn` fires after each draw with the plot's
 * element (for PNG export and the update timing).
 */
import { useLayoutEffect, useRef } from "react";
import { loadPlotly, type PlotlyModule, plotlyIfLoaded } from "./load-plotly";

export interface PlotlyFigureProps {
  data: unknown[];
  layout: Record<string, unknown>;
  label: string;
  className?: string;
  /** called just before each Plotly.react (the update timing's "rendered" stage) */
  onDraw?: () => void;
  onDrawn?: (element: HTMLElement) => void;
}

const CONFIG = { displaylogo: false, responsive: true, modeBarButtonsToRemove: ["select2d", "lasso2d", "toImage"] };

export default function PlotlyFigure({ data, layout, label, className, onDraw, onDrawn }: PlotlyFigureProps) {
  const element = useRef<HTMLElement>(null);
  const drawing = useRef(onDraw);
  drawing.current = onDraw;
  const drawn = useRef(onDrawn);
  drawn.current = onDrawn;

  useLayoutEffect(() => {
    const div = element.current;
    if (!div) return;
    let alive = true;
    const draw = (Plotly: PlotlyModule) => {
      if (!alive) return;
      drawing.current?.();
      // Plotly.react draws synchronously for these plots; its promise only says so
      Plotly.react(div, data, layout, CONFIG).then(() => {
        if (alive) drawn.current?.(div);
      });
    };
    const ready = plotlyIfLoaded();
    if (ready) draw(ready);
    else loadPlotly().then(draw);
    return () => {
      alive = false;
    };
  }, [data, layout]);

  useLayoutEffect(() => {
    const div = element.current;
    return () => {
      if (div) plotlyIfLoaded()?.purge(div);
    };
  }, []);

  // a figure, not an image: Plotly puts focusable controls (the mode bar) inside it
  return <figure ref={element} aria-label={label} className={className} />;
}
