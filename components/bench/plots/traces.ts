/**
 * Plot data for the bench, as plain Plotly trace objects built from results (pure, so it is tested without a
 * browser): the Bode plot (magnitude in dB above, phase in degrees below, one log frequency axis), the noise
 * density with each part's contribution, and |Zout(f)|. Units on the axes are the ones the figures use.
 */
import { OVERLAY_COLOURS, PLOT_COLOURS } from "./palette";

export type CurveStyle = "live" | "pinned" | "overlay";

export interface PlotCurve {
  id: string;
  label: string;
  frequency: number[];
  magnitude_db: number[];
  phase_deg: number[];
  style: CurveStyle;
  colour?: string;
}

export interface Envelope {
  frequency: number[];
  p5_db: number[];
  p95_db: number[];
}

const FONT = { family: "IBM Plex Sans, ui-sans-serif, sans-serif", size: 12, color: PLOT_COLOURS.inkSoft };

function line(style: CurveStyle, colour: string) {
  if (style === "live") return { color: colour, width: 2.5 };
  if (style === "pinned") return { color: colour, width: 2, dash: "dash" };
  return { color: colour, width: 1.5 };
}

const baseLayout = {
  font: FONT,
  paper_bgcolor: "rgba(0,0,0,0)",
  plot_bgcolor: "#fbf9f3",
  margin: { l: 56, r: 24, t: 12, b: 44 },
  showlegend: true,
  legend: { orientation: "h", y: -0.18, font: { size: 11 } },
  hovermode: "x unified",
  uirevision: "keep",
};

/**
 * Tick labels are drawn as they are, never hidden for crossing the plot's edge: Plotly's check for that measures
 * every label once per label on each redraw, which was a quarter of a Bode update. The margins leave the labels
 * room (the last frequency label, centred on the right edge, fits in the right margin).
 */
const TICK_LABELS = { ticklabeloverflow: "allow" } as const;

const logFrequencyAxis = {
  ...TICK_LABELS,
  type: "log",
  title: { text: "Frequency (Hz)" },
  gridcolor: PLOT_COLOURS.rule,
  zeroline: false,
  exponentformat: "SI",
};

export const BODE_LAYOUT = {
  ...baseLayout,
  xaxis: { ...logFrequencyAxis, anchor: "y2" },
  yaxis: { ...TICK_LABELS, title: { text: "Magnitude (dB)" }, domain: [0.4, 1], gridcolor: PLOT_COLOURS.rule, zeroline: false },
  yaxis2: {
    ...TICK_LABELS,
    title: { text: "Phase (°)" },
    domain: [0, 0.3],
    gridcolor: PLOT_COLOURS.rule,
    zeroline: false,
    dtick: 90,
  },
};

/**
 * The Bode layout with the frequency axis zoomed to a band (a remark's anchor). Plotly takes a log axis's range as
 * log10 of the limits. The zoom is the start only: `uirevision` keeps the person's own zoom until the band changes.
 */
export function bodeLayoutFor(range: { fromHz: number; toHz: number } | null): BodeLayout {
  if (!range) return BODE_LAYOUT;
  return {
    ...BODE_LAYOUT,
    uirevision: `band ${range.fromHz}–${range.toHz}`,
    xaxis: { ...BODE_LAYOUT.xaxis, range: [Math.log10(range.fromHz), Math.log10(range.toHz)], autorange: false },
  };
}

type BodeLayout = Omit<typeof BODE_LAYOUT, "xaxis" | "uirevision"> & {
  uirevision: string;
  xaxis: (typeof BODE_LAYOUT)["xaxis"] & { range?: number[]; autorange?: boolean };
};

export const NOISE_LAYOUT = {
  ...baseLayout,
  xaxis: logFrequencyAxis,
  yaxis: {
    ...TICK_LABELS,
    type: "log",
    title: { text: "Output noise (V/√Hz)" },
    gridcolor: PLOT_COLOURS.rule,
    exponentformat: "SI",
  },
};

export const IMPEDANCE_LAYOUT = {
  ...baseLayout,
  showlegend: false,
  xaxis: logFrequencyAxis,
  yaxis: { ...TICK_LABELS, type: "log", title: { text: "|Zout| (Ω)" }, gridcolor: PLOT_COLOURS.rule, exponentformat: "SI" },
};

/**
 * Phase made continuous for plotting: a step of more than 180° between neighbouring points is taken as a wrap of
 * the ±180° principal value and removed (an inverting stage then reads as a steady −180°-ish line, not a jump).
 * The first point keeps its principal value.
 */
export function unwrapDegrees(phase: readonly number[]): number[] {
  const out: number[] = [];
  let offset = 0;
  phase.forEach((p, i) => {
    if (i > 0) {
      const step = p + offset - out[i - 1];
      if (step > 180) offset -= 360 * Math.round(step / 360);
      else if (step < -180) offset += 360 * Math.round(-step / 360);
    }
    out.push(p + offset);
  });
  return out;
}

export function bodeTraces(curves: PlotCurve[], envelope?: Envelope | null): unknown[] {
  const traces: unknown[] = [];
  if (envelope) {
    // the spread band: 5th to 95th percentile, drawn first so curves sit on top
    traces.push(
      {
        x: envelope.frequency,
        y: envelope.p5_db,
        mode: "lines",
        line: { width: 0 },
        hoverinfo: "skip",
        showlegend: false,
        name: "p5",
      },
      {
        x: envelope.frequency,
        y: envelope.p95_db,
        mode: "lines",
        fill: "tonexty",
        fillcolor: "rgba(159, 209, 201, 0.45)",
        line: { width: 0 },
        name: "Spread (5–95 %)",
      },
    );
  }
  let overlayIndex = 0;
  for (const c of curves) {
    const colour =
      c.colour ??
      (c.style === "live"
        ? PLOT_COLOURS.trace
        : c.style === "pinned"
          ? PLOT_COLOURS.pinned
          : OVERLAY_COLOURS[overlayIndex++ % OVERLAY_COLOURS.length]);
    const common = { x: c.frequency, mode: "lines", line: line(c.style, colour), legendgroup: c.id, name: c.label };
    traces.push({ ...common, y: c.magnitude_db, hovertemplate: "%{y:.2f} dB" });
    traces.push({
      ...common,
      y: unwrapDegrees(c.phase_deg),
      yaxis: "y2",
      showlegend: false,
      hovertemplate: "%{y:.1f}°",
    });
  }
  return traces;
}

export interface NoiseData {
  frequency: number[];
  output_density: number[];
  contributions: Record<string, number[]>;
}

/** Parts contributing less than this fraction of the total power everywhere are left out (they only crowd the plot). */
export const NOISE_CONTRIBUTION_SHOWN_FRACTION = 1e-4;

/** A measured noise spectrum in the plot's unit (V/√Hz), drawn dashed over the simulated total. */
export interface MeasuredNoiseCurve {
  label: string;
  frequency: number[];
  density: number[];
  colour: string;
}

export function noiseTraces(noise: NoiseData, measured?: MeasuredNoiseCurve | null): unknown[] {
  const traces: unknown[] = [
    {
      x: noise.frequency,
      y: noise.output_density,
      mode: "lines",
      name: "Total",
      line: { color: PLOT_COLOURS.trace, width: 2.5 },
    },
  ];
  let i = 0;
  for (const [part, density] of Object.entries(noise.contributions)) {
    const matters = density.some((d, k) => d * d >= NOISE_CONTRIBUTION_SHOWN_FRACTION * noise.output_density[k] ** 2);
    if (!matters) continue;
    traces.push({
      x: noise.frequency,
      y: density,
      mode: "lines",
      name: part,
      line: { color: OVERLAY_COLOURS[i++ % OVERLAY_COLOURS.length], width: 1.5 },
    });
  }
  if (measured) {
    traces.push({
      x: measured.frequency,
      y: measured.density,
      mode: "lines+markers",
      name: measured.label,
      line: { color: measured.colour, width: 2, dash: "dash" },
      marker: { size: 4, color: measured.colour },
    });
  }
  return traces;
}

export function impedanceTraces(frequency: number[], magnitudeOhm: number[]): unknown[] {
  return [
    {
      x: frequency,
      y: magnitudeOhm,
      mode: "lines",
      name: "|Zout|",
      line: { color: PLOT_COLOURS.trace, width: 2.5 },
      hovertemplate: "%{y:.4s} Ω",
    },
  ];
}
