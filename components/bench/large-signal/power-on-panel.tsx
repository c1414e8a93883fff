"use client";
/**
 * The power-on view: every capacitor empty and every source stepping to its DC value at t = 0⁺; the capsule's
 * polarisation (and a chosen net) against time, with the settle time (within 1 % of the final polarisation).
 */
import dynamic from "next/dynamic";
import { useMemo, useState } from "react";
import { POWER_ON_SETTLE_FRACTION } from "@/sim/analyses/power-on";
import { OVERLAY_COLOURS, PLOT_COLOURS } from "../plots/palette";
import { formatSi } from "../results/format";
import type { PowerOnJobResult } from "./compute-large-signal";
import { JobControls } from "./job-controls";
import type { LargeSignalJobs } from "./use-large-signal";

const PlotlyFigure = dynamic(() => import("../plots/plotly-figure"), { ssr: false });

function powerOnPlot(result: PowerOnJobResult, net: string | null) {
  const t = result.transient.time;
  const data: Record<string, unknown>[] = Object.entries(result.transient.polarisation ?? {}).map(([id, v], i) => ({
    type: "scatter",
    mode: "lines",
    name: `Polarisation of ${id}`,
    x: t,
    y: v,
    line: { color: i === 0 ? PLOT_COLOURS.trace : OVERLAY_COLOURS[3 + i], width: 2 },
  }));
  if (net && result.transient.nets[net]) {
    data.push({
      type: "scatter",
      mode: "lines",
      name: `V(${net})`,
      x: t,
      y: result.transient.nets[net],
      line: { color: OVERLAY_COLOURS[0], width: 1.5 },
    });
  }
  const settle = result.settleTimeS;
  return {
    data,
    layout: {
      font: { family: "ui-sans-serif, system-ui", size: 11, color: PLOT_COLOURS.ink },
      margin: { l: 56, r: 16, t: 28, b: 44 },
      height: 300,
      paper_bgcolor: "rgba(0,0,0,0)",
      plot_bgcolor: "#ffffff",
      legend: { orientation: "h", y: 1.14 },
      xaxis: { title: { text: "Time from switch-on (s)" }, gridcolor: PLOT_COLOURS.rule },
      yaxis: { title: { text: "Volts" }, gridcolor: PLOT_COLOURS.rule },
      shapes:
        settle === null
          ? []
          : [
              {
                type: "line",
                x0: settle,
                x1: settle,
                yref: "paper",
                y0: 0,
                y1: 1,
                line: { color: OVERLAY_COLOURS[2], dash: "dash" },
              },
            ],
      annotations:
        settle === null
          ? []
          : [
              {
                x: settle,
                yref: "paper",
                y: 0.05,
                text: `settled: ${settle.toFixed(2)} s`,
                showarrow: false,
                xanchor: "left",
              },
            ],
    },
  };
}

export function PowerOnPanel({
  jobs,
  circuit,
  variant,
  defaultStop,
  nets,
  hasCapsule,
}: {
  jobs: LargeSignalJobs;
  circuit: unknown;
  variant?: string;
  defaultStop: number;
  nets: string[];
  hasCapsule: boolean;
}) {
  const { job, request, start, outdated } = jobs.powerOn;
  const [stopText, setStopText] = useState(String(defaultStop));
  const [net, setNet] = useState("");
  const stop = Number(stopText);
  const stopProblem =
    Number.isFinite(stop) && stop > 0 && stop <= 600 ? null : "Give a run length between 0 and 600 s.";
  const result = job.result?.ok ? job.result.value : null;
  const plot = useMemo(() => (result ? powerOnPlot(result, request?.probe[0] ?? null) : null), [result, request]);
  return (
    <section aria-label="Power-on" className="space-y-3" data-testid="power-on-panel">
      <p className="rounded border border-caution/40 bg-caution-bg px-2 py-1 text-xs text-ink">
        Caution: a polarisation supply holds its charge after switch-off; discharge it before touching the capsule or
        the bias network, and follow local codes and qualified practice for the supply voltages involved.
      </p>
      <div className="flex flex-wrap items-end gap-4 text-sm">
        <label className="flex flex-col text-xs">
          Run for (s)
          <input
            value={stopText}
            onChange={(e) => setStopText(e.target.value)}
            inputMode="decimal"
            className="w-20 rounded border border-rule bg-paper px-1 py-0.5 font-mono text-sm"
            aria-invalid={stopProblem !== null}
          />
        </label>
        <label className="flex flex-col text-xs">
          Also show net
          <select
            value={net}
            onChange={(e) => setNet(e.target.value)}
            className="rounded border border-rule bg-paper px-1 py-0.5 text-sm"
            aria-label="Net shown with the polarisation"
          >
            <option value="">(polarisation only)</option>
            {nets.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <JobControls
          job={job}
          label="power-on"
          runLabel="Run power-on"
          outdated={outdated}
          disabled={
            stopProblem ?? (hasCapsule ? null : "The power-on view follows a capsule's polarisation; add a capsule.")
          }
          onRun={() => start({ circuit, variant, stop, probe: net ? [net] : [] })}
        />
      </div>
      {result && (
        <div className={job.stale || outdated ? "opacity-60" : ""}>
          <p className="text-sm" data-testid="settle-time">
            Settle time (polarisation within {100 * POWER_ON_SETTLE_FRACTION} % of its final value):{" "}
            <span className="font-mono">
              {result.settleTimeS === null
                ? "not settled by the end of the run — run for longer"
                : formatSi(result.settleTimeS, "s")}
            </span>
          </p>
          {plot && <PlotlyFigure data={plot.data} layout={plot.layout} label="Power-on" className="w-full" />}
        </div>
      )}
    </section>
  );
}
