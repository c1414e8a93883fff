/**
 * Plotly data and layouts of the distortion panel: THD against SPL (log THD axis) with max_spl_db and
 * max_spl_1pct_db marked, and the time waveform at the output and a chosen net.
 */
import type { DistortionPoint, Figures, TransientResult } from "@/sim/results";
import { MAX_SPL_1PCT_THD_PERCENT, MAX_SPL_THD_PERCENT } from "@/sim/analyses/max-spl";
import { OVERLAY_COLOURS, PLOT_COLOURS } from "../plots/palette";

const FONT = { family: "ui-sans-serif, system-ui", size: 11, color: PLOT_COLOURS.ink };
const MARGIN = { l: 56, r: 16, t: 28, b: 44 };

function marker(x: number, label: string, dash: string) {
  return {
    shape: {
      type: "line",
      x0: x,
      x1: x,
      yref: "paper",
      y0: 0,
      y1: 1,
      line: { color: OVERLAY_COLOURS[2], dash, width: 1.5 },
    },
    annotation: {
      x,
      yref: "paper",
      y: 1,
      text: label,
      showarrow: false,
      yanchor: "bottom",
      font: { ...FONT, size: 10 },
    },
  };
}

export function thdPlot(points: DistortionPoint[], figures: Figures) {
  const data = [
    {
      type: "scatter",
      mode: "lines+markers",
      name: "THD",
      x: points.map((p) => p.spl_db),
      y: points.map((p) => Math.max(p.thd_percent, 1e-6)),
      line: { color: PLOT_COLOURS.trace, width: 2 },
      hovertemplate: "%{x:.1f} dB SPL: %{y:.3g} %<extra></extra>",
    },
  ];
  const marks = [
    [figures.max_spl_db, `${MAX_SPL_THD_PERCENT} %: ${(figures.max_spl_db as number)?.toFixed?.(1)} dB`, "dash"],
    [
      figures.max_spl_1pct_db,
      `${MAX_SPL_1PCT_THD_PERCENT} %: ${(figures.max_spl_1pct_db as number)?.toFixed?.(1)} dB`,
      "dot",
    ],
  ]
    .filter(([x]) => typeof x === "number")
    .map(([x, label, dash]) => marker(x as number, label as string, dash as string));
  const thresholds = [MAX_SPL_THD_PERCENT, MAX_SPL_1PCT_THD_PERCENT].map((y) => ({
    type: "line",
    xref: "paper",
    x0: 0,
    x1: 1,
    y0: y,
    y1: y,
    line: { color: PLOT_COLOURS.rule, width: 1 },
  }));
  const layout = {
    font: FONT,
    margin: MARGIN,
    height: 300,
    paper_bgcolor: "rgba(0,0,0,0)",
    plot_bgcolor: "#ffffff",
    showlegend: false,
    xaxis: { title: { text: "Level at the capsule (dB SPL)" }, gridcolor: PLOT_COLOURS.rule },
    yaxis: { title: { text: "THD (%)" }, type: "log", gridcolor: PLOT_COLOURS.rule, exponentformat: "power" },
    shapes: [...thresholds, ...marks.map((m) => m.shape)],
    annotations: marks.map((m, i) => ({ ...m.annotation, xanchor: i === 0 ? "right" : "left" })),
  };
  return { data, layout };
}

export function waveformPlot(waveform: TransientResult, net: string | null, outputLabel: string) {
  const t = waveform.time.map((s) => s * 1000);
  const data: Record<string, unknown>[] = [
    {
      type: "scatter",
      mode: "lines",
      name: outputLabel,
      x: t,
      y: waveform.output,
      line: { color: PLOT_COLOURS.trace, width: 2 },
    },
  ];
  if (net && waveform.nets[net]) {
    data.push({
      type: "scatter",
      mode: "lines",
      name: `V(${net})`,
      x: t,
      y: waveform.nets[net],
      yaxis: "y2",
      line: { color: OVERLAY_COLOURS[0], width: 1.5 },
    });
  }
  const layout = {
    font: FONT,
    margin: { ...MARGIN, r: 56 },
    height: 260,
    paper_bgcolor: "rgba(0,0,0,0)",
    plot_bgcolor: "#ffffff",
    legend: { orientation: "h", y: 1.12 },
    xaxis: { title: { text: "Time (ms)" }, gridcolor: PLOT_COLOURS.rule },
    yaxis: { title: { text: "Output (V)" }, gridcolor: PLOT_COLOURS.rule },
    yaxis2: { title: { text: net ? `V(${net}) (V)` : "" }, overlaying: "y", side: "right", showgrid: false },
  };
  return { data, layout };
}
