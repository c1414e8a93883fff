"use client";
/**
 * The bench's one Plotly wrapper: creates the plot once, updates it in place with Plotly.react on every change
 * (never re-created, so an update costs only the redraw), purges it on unmount. `onDrawn` fires after each draw
 * with the plot's element (for PNG export and the update timing).
 */
import { useEffect, useRef } from "react";
import { loadPlotly } from "./load-plotly";

export interface PlotlyFigureProps {
  data: unknown[];
  layout: Record<string, unknown>;
  label: string;
  className?: string;
  onDrawn?: (element: HTMLElement) => void;
}

const CONFIG = { displaylogo: false, responsive: true, modeBarButtonsToRemove: ["select2d", "lasso2d", "toImage"] };

export default function PlotlyFigure({ data, layout, label, className, onDrawn }: PlotlyFigureProps) {
  const element = useRef<HTMLElement>(null);
  const drawn = useRef(onDrawn);
  drawn.current = onDrawn;

  useEffect(() => {
    const div = element.current;
    let alive = true;
    loadPlotly().then(async (Plotly) => {
      if (!alive || !div) return;
      await Plotly.react(div, data, layout, CONFIG);
      if (alive) drawn.current?.(div);
    });
    return () => {
      alive = false;
    };
  }, [data, layout]);

  useEffect(() => {
    const div = element.current;
    return () => {
      if (div) loadPlotly().then((Plotly) => Plotly.purge(div));
    };
  }, []);

  // a figure, not an image: Plotly puts focusable controls (the mode bar) inside it
  return <figure ref={element} aria-label={label} className={className} />;
}
