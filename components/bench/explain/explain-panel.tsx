"use client";
/**
 * "What moves this figure": for each figure, the parts whose values it depends on most (by re-solving with each
 * value nudged 1 %, sim/analyses/figure-sensitivity), worked out on the long-job worker when asked; and the notes
 * pinned to parts and nets, as callouts that select their part.
 */
import { useMemo, useState } from "react";
import type { LayoutNote } from "../document";
import type { SolverHandle } from "../solver/client";
import type { ExplainRequest, ExplainResult, Outcome } from "../solver/protocol";
import { useLongJob } from "../solver/use-long-job";

/** How many parts each figure lists. */
export const TOP_PARTS_SHOWN = 3;

const FIGURE_LABELS: Record<string, string> = {
  gain_1khz_db: "Gain at 1 kHz",
  sensitivity_v_per_pa: "Sensitivity (V/Pa)",
  sensitivity_db_re_1v_per_pa: "Sensitivity (dB re 1 V/Pa)",
  low_corner_hz: "Low corner",
  high_corner_hz: "High corner",
  output_impedance_1khz_ohm: "Output impedance",
  self_noise_dba_spl: "Self-noise",
};

const runExplain = (api: SolverHandle["api"], request: ExplainRequest, onProgress: (d: number, t: number) => void) =>
  api.explain(request, onProgress) as Promise<Outcome<ExplainResult>>;

/** "+1 % on R1 → −0.52 %" or "+1 % → −0.09 dB": what a 1 % increase does, in words a junior can read. */
function effect(sensitivity: number, elasticity: number | null): string {
  const sign = (x: number) => (x >= 0 ? "+" : "−");
  if (elasticity !== null) return `${sign(elasticity)}${Math.abs(elasticity).toFixed(2)} %`;
  const db = sensitivity * Math.log(1.01);
  return `${sign(db)}${Math.abs(db).toFixed(3)} dB`;
}

export function ExplainPanel({
  circuit,
  variant,
  notes,
  onSelectPart,
}: {
  circuit: unknown;
  variant?: string;
  notes: LayoutNote[];
  onSelectPart?: (id: string) => void;
}) {
  const [wanted, setWanted] = useState(false);
  const request = useMemo(() => (wanted ? { circuit, variant } : null), [wanted, circuit, variant]);
  const key = useMemo(() => (request ? JSON.stringify(request) : ""), [request]);
  const job = useLongJob(runExplain, request, key);
  const outcome = job.result;
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
      <section aria-label="What moves this figure" className="space-y-2">
        <div className="flex items-center gap-3">
          <h3 className="text-sm font-semibold">What moves this figure</h3>
          {!wanted ? (
            <button
              type="button"
              onClick={() => setWanted(true)}
              className="rounded bg-graphite px-2 py-0.5 text-xs text-paper"
            >
              Work it out
            </button>
          ) : job.status === "running" ? (
            <>
              <progress
                max={job.progress?.total ?? 1}
                value={job.progress?.done ?? 0}
                className="h-2 w-32"
                aria-label="Explaining progress"
              />
              <button type="button" onClick={job.cancel} className="text-xs underline">
                Cancel
              </button>
            </>
          ) : job.status === "cancelled" ? (
            <button
              type="button"
              onClick={() => {
                setWanted(false);
                setTimeout(() => setWanted(true), 0);
              }}
              className="text-xs underline"
            >
              Cancelled — start again
            </button>
          ) : null}
        </div>
        <p className="text-xs text-ink-soft">
          Each value is nudged 1 % up and down and the circuit re-solved; a part listed first moves the figure most.
        </p>
        {outcome && !outcome.ok && <p className="text-xs text-caution">{outcome.error.message}</p>}
        {outcome?.ok && (
          <ul className={`grid gap-3 sm:grid-cols-2 ${job.stale ? "opacity-60" : ""}`} data-testid="explain-result">
            {outcome.value
              .filter((f) => f.figure !== "sensitivity_v_per_pa")
              .map((f) => (
                <li key={f.figure} className="rounded border border-rule bg-paper px-2 py-1.5">
                  <p className="text-xs font-semibold">{FIGURE_LABELS[f.figure] ?? f.figure}</p>
                  <ol className="mt-1 space-y-0.5 text-xs">
                    {f.ranked.slice(0, TOP_PARTS_SHOWN).map((s) => (
                      <li key={`${s.part}.${s.field}`} className="flex justify-between gap-2">
                        <button
                          type="button"
                          className="font-mono text-trace hover:underline"
                          onClick={() => onSelectPart?.(s.part)}
                        >
                          {s.part}.{s.field}
                        </button>
                        <span className="font-mono text-ink-soft">+1 % → {effect(s.sensitivity, s.elasticity)}</span>
                      </li>
                    ))}
                  </ol>
                </li>
              ))}
          </ul>
        )}
      </section>
      <section aria-label="Notes" className="space-y-2">
        <h3 className="text-sm font-semibold">Notes on parts and nets</h3>
        {notes.length === 0 ? (
          <p className="text-xs text-ink-soft">No notes pinned yet.</p>
        ) : (
          <ul className="space-y-2">
            {notes.map((n) => (
              <li key={n.id} className="relative rounded border border-brass/60 bg-brass-light/30 px-2 py-1.5 text-xs">
                <span className="font-mono font-semibold">
                  {n.part ? (
                    <button
                      type="button"
                      className="text-brass-deep hover:underline"
                      onClick={() => onSelectPart?.(n.part as string)}
                    >
                      {n.part}
                    </button>
                  ) : (
                    `net ${n.net ?? "—"}`
                  )}
                </span>
                <span className="ml-2">{n.text}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
