"use client";
/**
 * The bench's plots: Bode (magnitude and phase), output noise with per-part contributions (when the engine gives
 * noise), and |Zout(f)|. Each is one PlotlyFigure updated in place. PNG export per plot, CSV of every curve.
 * Loaded with next/dynamic (ssr: false) so Plotly stays on the bench.
 */
import { useMemo, useRef, useState } from "react";
import type { NoiseResult } from "@/sim/results";
import { useAnchorRange } from "../anchor-range";
import { notePlotted, noteStage } from "../solver/update-timing";
import { loadPlotly } from "./load-plotly";
import PlotlyFigure from "./plotly-figure";
import { type CsvSeries, downloadText, resultsCsv } from "./results-csv";
import {
  bodeLayoutFor,
  bodeTraces,
  type Envelope,
  IMPEDANCE_LAYOUT,
  impedanceTraces,
  type MeasuredNoiseCurve,
  NOISE_LAYOUT,
  noiseTraces,
  type PlotCurve,
} from "./traces";

export interface PlotsPanelProps {
  curves: PlotCurve[];
  envelope?: Envelope | null;
  noise?: NoiseResult | null;
  /** a measured noise spectrum laid over the simulated density (from the Measurements tab) */
  measuredNoise?: MeasuredNoiseCurve | null;
  impedance: { frequency: number[]; magnitude_ohm: number[] } | null;
  /** the live result's generation, reported when the Bode plot has drawn it */
  generation: number;
  title: string;
}

type PlotName = "bode" | "noise" | "impedance";

const TABS: { name: PlotName; label: string }[] = [
  { name: "bode", label: "Response" },
  { name: "noise", label: "Noise" },
  { name: "impedance", label: "Output impedance" },
];

function fileStem(title: string): string {
  return (title.trim() || "design")
    .replace(/[^A-Za-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .toLowerCase();
}

export default function PlotsPanel({ curves, envelope, noise, measuredNoise, impedance, generation, title }: PlotsPanelProps) {
  const [tab, setTab] = useState<PlotName>("bode");
  const elements = useRef<Partial<Record<PlotName, HTMLElement>>>({});
  const bode = useMemo(() => bodeTraces(curves, envelope), [curves, envelope]);
  const anchor = useAnchorRange();
  const noiseData = useMemo(() => (noise ? noiseTraces(noise, measuredNoise) : []), [noise, measuredNoise]);
  const zout = useMemo(
    () => (impedance ? impedanceTraces(impedance.frequency, impedance.magnitude_ohm) : []),
    [impedance],
  );
  const generationRef = useRef(generation);
  generationRef.current = generation;
  // a lone curve needs no legend (and Plotly then skips laying one out on every update)
  const single = bode.length <= 2;
  const bodeLayout = useMemo(() => {
    const layout = bodeLayoutFor(anchor);
    return single ? { ...layout, showlegend: false } : layout;
  }, [anchor, single]);

  const exportPng = async () => {
    const element = elements.current[tab];
    if (!element) return;
    const Plotly = await loadPlotly();
    await Plotly.downloadImage(element, {
      format: "png",
      filename: `${fileStem(title)}-${tab}`,
      width: 1200,
      height: 700,
    });
  };

  const exportCsv = () => {
    const series: CsvSeries[] = curves.flatMap((c) => [
      { name: `${c.label} magnitude_db`, frequency: c.frequency, values: c.magnitude_db },
      { name: `${c.label} phase_deg`, frequency: c.frequency, values: c.phase_deg },
    ]);
    if (impedance) series.push({ name: "zout_ohm", frequency: impedance.frequency, values: impedance.magnitude_ohm });
    if (noise) series.push({ name: "noise_v_per_rthz", frequency: noise.frequency, values: noise.output_density });
    if (measuredNoise) series.push({ name: `${measuredNoise.label} v_per_rthz`, frequency: measuredNoise.frequency, values: measuredNoise.density });
    downloadText(`${fileStem(title)}-results.csv`, resultsCsv(series));
  };

  return (
    <section aria-label="Plots" className="flex min-w-0 flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2">
        <div role="tablist" aria-label="Plot" className="flex gap-1">
          {TABS.map((t) => (
            <button
              key={t.name}
              type="button"
              role="tab"
              aria-selected={tab === t.name}
              onClick={() => setTab(t.name)}
              className={`rounded px-2.5 py-1 text-sm ${tab === t.name ? "bg-graphite text-paper" : "text-ink-soft hover:bg-paper-deep"}`}
            >
              {t.label}
            </button>
          ))}
        </div>
        <div className="ml-auto flex gap-2">
          <button
            type="button"
            onClick={exportPng}
            className="rounded border border-rule px-2 py-1 text-xs hover:bg-paper-deep"
          >
            Export PNG
          </button>
          <button
            type="button"
            onClick={exportCsv}
            className="rounded border border-rule px-2 py-1 text-xs hover:bg-paper-deep"
          >
            Export CSV
          </button>
        </div>
      </div>
      {/* only the shown plot is mounted (a hidden Plotly plot cannot size itself); value changes update it in place */}
      {tab === "bode" && (
        <div data-testid="plot-bode">
          <PlotlyFigure
            data={bode}
            layout={bodeLayout}
            label="Magnitude and phase against frequency"
            className="h-[380px] w-full"
            onDraw={() => noteStage(generationRef.current, "rendered")}
            onDrawn={(el) => {
              elements.current.bode = el;
              notePlotted(generationRef.current);
            }}
          />
        </div>
      )}
      {tab === "noise" && (
        <div data-testid="plot-noise">
          {noise ? (
            <PlotlyFigure
              data={noiseData}
              layout={NOISE_LAYOUT}
              label="Output noise density"
              className="h-[380px] w-full"
              onDrawn={(el) => {
                elements.current.noise = el;
              }}
            />
          ) : (
            <p className="p-4 text-sm text-ink-soft">
              The engine has not returned a noise analysis for this circuit, so there is no noise density to plot.
            </p>
          )}
        </div>
      )}
      {tab === "impedance" && (
        <div data-testid="plot-impedance">
          <PlotlyFigure
            data={zout}
            layout={IMPEDANCE_LAYOUT}
            label="Output impedance against frequency"
            className="h-[380px] w-full"
            onDrawn={(el) => {
              elements.current.impedance = el;
            }}
          />
        </div>
      )}
    </section>
  );
}
