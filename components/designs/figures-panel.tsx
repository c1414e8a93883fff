import type { Figures } from "@/sim";
import { formatFixed, formatSi } from "@/components/bench/results/format";

interface Row {
  label: string;
  value: string;
}

/** The headline figures in the order a datasheet lists them, each with its unit. */
function rows(f: Figures): Row[] {
  const num = (v: unknown) => (typeof v === "number" ? v : null);
  return [
    { label: "Sensitivity", value: formatSi(num(f.sensitivity_v_per_pa), "V/Pa") },
    { label: "Sensitivity re 1 V/Pa", value: formatFixed(num(f.sensitivity_db_re_1v_per_pa), 1, "dB") },
    { label: "Gain at 1 kHz", value: formatFixed(num(f.gain_1khz_db), 1, "dB") },
    { label: "Low corner (−3 dB)", value: formatSi(num(f.low_corner_hz), "Hz") },
    { label: "High corner (−3 dB)", value: formatSi(num(f.high_corner_hz), "Hz") },
    { label: "Output impedance at 1 kHz", value: formatSi(num(f.output_impedance_1khz_ohm), "Ω") },
    { label: "Polarity", value: typeof f.polarity === "string" ? f.polarity : "—" },
    { label: "Self-noise", value: formatFixed(num(f.self_noise_dba_spl), 1, "dB(A) SPL") },
  ];
}

export function FiguresPanel({ figures }: { figures: Figures }) {
  return (
    <dl className="grid grid-cols-1 gap-px overflow-hidden rounded-md border border-rule bg-rule sm:grid-cols-2">
      {rows(figures).map((row) => (
        <div key={row.label} className="flex items-baseline justify-between gap-3 bg-paper px-3 py-2">
          <dt className="text-sm text-ink-soft">{row.label}</dt>
          <dd className="font-mono text-sm text-ink">{row.value}</dd>
        </div>
      ))}
    </dl>
  );
}
