"use client";
/**
 * The distortion panel: a level sweep at the design's drive (THD against SPL, max_spl_db and max_spl_1pct_db
 * marked), the harmonics H2…H10 at a level the user picks, and the time waveform at the output and any net.
 */
import dynamic from "next/dynamic";
import { useMemo, useState } from "react";
import { maxSplWords } from "./limit-words";
import { thdPlot, waveformPlot } from "./distortion-plots";
import { harmonicPercent } from "./harmonic-percent";
import { JobControls } from "./job-controls";
import { sweepLevels } from "./drive-defaults";
import type { LargeSignalJobs } from "./use-large-signal";

const PlotlyFigure = dynamic(() => import("../plots/plotly-figure"), { ssr: false });

export function DistortionPanel({
  jobs,
  circuit,
  variant,
  frequency,
  nets,
  hasCapsule,
}: {
  jobs: LargeSignalJobs;
  circuit: unknown;
  variant?: string;
  frequency: number;
  nets: string[];
  hasCapsule: boolean;
}) {
  const { job, request, start, outdated } = jobs.distortion;
  const levels = useMemo(() => sweepLevels(), []);
  const [waveformLevel, setWaveformLevel] = useState(118);
  const [net, setNet] = useState<string>(nets[0] ?? "");
  const [picked, setPicked] = useState<number | null>(null);
  const outcome = job.result;
  const result = outcome?.ok ? outcome.value : null;
  const point = result?.points.find((p) => p.spl_db === (picked ?? result.waveformSplDb)) ?? result?.points[0] ?? null;
  const thd = useMemo(() => (result ? thdPlot(result.points, result.figures) : null), [result]);
  const wave = useMemo(
    () => (result ? waveformPlot(result.waveform, request?.probe[0] ?? null, "Output") : null),
    [result, request],
  );
  const maxSpl = result ? maxSplWords(result.figures) : null;
  return (
    <section aria-label="Distortion" className="space-y-3" data-testid="distortion-panel">
      <div className="flex flex-wrap items-end gap-4 text-sm">
        <p>
          Drive: sine at <span className="font-mono">{frequency} Hz</span> at the capsule, swept {levels[0]}–
          {levels[levels.length - 1]} dB SPL
        </p>
        <label className="flex flex-col text-xs">
          Waveform at
          <select
            value={waveformLevel}
            onChange={(e) => setWaveformLevel(Number(e.target.value))}
            className="rounded border border-rule bg-paper px-1 py-0.5 text-sm"
          >
            {levels.map((l) => (
              <option key={l} value={l}>
                {l} dB SPL
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col text-xs">
          Also show net
          <select
            value={net}
            onChange={(e) => setNet(e.target.value)}
            className="rounded border border-rule bg-paper px-1 py-0.5 text-sm"
            aria-label="Net shown with the output"
          >
            <option value="">(output only)</option>
            {nets.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <JobControls
          job={job}
          label="distortion"
          runLabel="Run distortion"
          outdated={outdated}
          disabled={hasCapsule ? null : "Distortion against SPL needs a capsule in the circuit."}
          onRun={() => {
            setPicked(null);
            start({
              circuit,
              variant,
              frequency,
              splDb: levels,
              waveformSplDb: waveformLevel,
              probe: net ? [net] : [],
            });
          }}
        />
      </div>
      {maxSpl && (
        <p className="text-sm" data-testid="distortion-max-spl">
          Maximum SPL: <span className="font-mono">{maxSpl.value}</span>
          {maxSpl.note && <span className="ml-2 text-ink-soft">— {maxSpl.note}</span>}
        </p>
      )}
      {result && (
        <div
          className={`grid grid-cols-1 gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] ${job.stale || outdated ? "opacity-60" : ""}`}
        >
          <div className="min-w-0 space-y-3">
            {thd && <PlotlyFigure data={thd.data} layout={thd.layout} label="THD against SPL" className="w-full" />}
            {wave && <PlotlyFigure data={wave.data} layout={wave.layout} label="Waveform" className="w-full" />}
          </div>
          <div className="min-w-0 space-y-2">
            <label className="flex items-center gap-2 text-xs">
              Harmonics at
              <select
                value={point?.spl_db ?? ""}
                onChange={(e) => setPicked(Number(e.target.value))}
                className="rounded border border-rule bg-paper px-1 py-0.5 text-sm"
                aria-label="Level of the harmonic table"
              >
                {result.points.map((p) => (
                  <option key={p.spl_db} value={p.spl_db}>
                    {p.spl_db} dB SPL
                  </option>
                ))}
              </select>
            </label>
            {point && (
              <table className="w-full text-sm" data-testid="harmonic-table">
                <caption className="text-left text-xs text-ink-soft">
                  THD{" "}
                  <span className="font-mono" data-testid="harmonic-thd">
                    {point.thd_percent.toPrecision(3)} %
                  </span>{" "}
                  · fundamental {point.fundamental.toPrecision(3)} V peak
                </caption>
                <thead>
                  <tr className="border-b border-rule text-left text-xs text-ink-soft">
                    <th className="py-1">Harmonic</th>
                    <th className="py-1 text-right">dB re fundamental</th>
                    <th className="py-1 text-right">%</th>
                  </tr>
                </thead>
                <tbody className="font-mono">
                  {point.harmonics_db
                    .map((db, i) => ({ order: i + 2, db }))
                    .map(({ order, db }) => (
                      <tr key={order} className="border-b border-rule/60">
                        <td className="py-0.5 font-sans">H{order}</td>
                        <td className="py-0.5 text-right">
                          {db <= -200 ? "below −200" : db.toFixed(1).replace("-", "−")}
                        </td>
                        <td className="py-0.5 text-right">{harmonicPercent(db).toPrecision(3)}</td>
                      </tr>
                    ))}
                </tbody>
              </table>
            )}
            {point?.warnings?.map((w) => (
              <p key={w.message} className="text-xs text-caution">
                {w.message}
              </p>
            ))}
          </div>
        </div>
      )}
    </section>
  );
}
