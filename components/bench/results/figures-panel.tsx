"use client";
/**
 * The figures: the headline numbers of the design as solved. A figure the engine leaves null shows "—" with the
 * reason it does not apply, so an empty cell is never a mystery.
 */
import type { Figures } from "@/sim/results";
import { formatFixed, formatSi } from "./format";

export interface FigureRow {
  key: string;
  label: string;
  value: string;
  /** why the figure is missing, when it is */
  reason?: string;
}

export function figureRows(figures: Figures, hasCapsule: boolean, noiseRan: boolean): FigureRow[] {
  const f = figures;
  const missing = (value: unknown, reason: string) => (value === null || value === undefined ? reason : undefined);
  const noCapsule = hasCapsule ? "the capsule gives no output at 1 kHz" : "no capsule is driven in this circuit";
  const sens = f.sensitivity_v_per_pa as number | null | undefined;
  return [
    {
      key: "sensitivity",
      label: "Sensitivity",
      value:
        sens == null
          ? "—"
          : `${formatFixed(sens * 1000, 2, "mV/Pa")} · ${formatFixed(f.sensitivity_db_re_1v_per_pa as number, 1, "dB re 1 V/Pa")}`,
      reason: missing(sens, noCapsule),
    },
    {
      key: "gain",
      label: "Gain at 1 kHz",
      value: formatFixed(f.gain_1khz_db as number | null, 2, "dB"),
      reason: missing(f.gain_1khz_db, "the output does not respond at 1 kHz"),
    },
    {
      key: "low",
      label: "Low corner (−3 dB)",
      value: formatSi(f.low_corner_hz as number | null, "Hz"),
      reason: missing(f.low_corner_hz, "the response stays within 3 dB down to 0.1 Hz"),
    },
    {
      key: "high",
      label: "High corner (−3 dB)",
      value: formatSi(f.high_corner_hz as number | null, "Hz"),
      reason: missing(f.high_corner_hz, "the response stays within 3 dB up to 1 MHz"),
    },
    {
      key: "zout",
      label: "Output impedance at 1 kHz",
      value: formatSi(f.output_impedance_1khz_ohm as number | null, "Ω"),
      reason: missing(f.output_impedance_1khz_ohm, "the output impedance is not finite"),
    },
    {
      key: "polarity",
      label: "Polarity",
      value: (f.polarity as string | null) ?? "—",
      reason: missing(f.polarity, "the output does not respond at 1 kHz"),
    },
    {
      key: "self-noise",
      label: "Self-noise",
      value: formatFixed(f.self_noise_dba_spl as number | null, 1, "dB(A) SPL"),
      reason: missing(
        f.self_noise_dba_spl,
        !noiseRan ? "the engine has not run a noise analysis for this circuit" : noCapsule,
      ),
    },
  ];
}

export function FiguresPanel({
  figures,
  hasCapsule,
  noiseRan,
  stale,
  extraRows = [],
}: {
  figures: Figures;
  hasCapsule: boolean;
  noiseRan: boolean;
  stale?: boolean;
  /** figures from runs apart from the live solve (max SPL from the distortion panel) */
  extraRows?: FigureRow[];
}) {
  const rows = [...figureRows(figures, hasCapsule, noiseRan), ...extraRows];
  return (
    <section
      aria-label="Figures"
      data-testid="figures-panel"
      aria-busy={stale}
      // dimmed at once, not faded: a fade is 150 ms of frames for the page to paint while the result is on its way
      // (bench:ui's worker round trip, median of 4 runs: about 24 → 21 ms)
      className={stale ? "opacity-60" : undefined}
    >
      <dl className="grid grid-cols-1 gap-x-6 gap-y-2 sm:grid-cols-2">
        {rows.map((row) => (
          <div
            key={row.key}
            className={`flex flex-col border-b border-rule pb-1.5 ${row.key === "sensitivity" ? "sm:col-span-2" : ""}`}
            data-figure={row.key}
          >
            <dt className="text-xs uppercase tracking-wide text-ink-soft">{row.label}</dt>
            <dd className="font-mono text-sm text-ink" data-testid={`figure-${row.key}`}>
              {row.value}
              {row.reason && <span className="ml-2 font-sans text-xs text-ink-soft">({row.reason})</span>}
            </dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
