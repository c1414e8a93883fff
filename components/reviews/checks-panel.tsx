import { formatSi } from "@/components/bench/results/format";
import { TARGET_FIGURE_LABELS, TARGET_FIGURES, type TargetFigure } from "@/components/schemas/targets";

/** A stored check, as the server sends it (db/revision-checks.ts). */
export interface CheckRow {
  figure: string;
  variant?: string;
  value: number | string | null;
  min?: number;
  max?: number;
  pass: boolean;
}

export function figureLabel(figure: string): string {
  return TARGET_FIGURE_LABELS[figure as TargetFigure] ?? figure;
}

export function figureUnit(figure: string): string {
  return TARGET_FIGURES[figure as TargetFigure] ?? "";
}

/** Units read with an SI prefix ("14.43 kHz", "11.88 mV/Pa"); levels in dB keep their plain number. */
const PREFIXED_UNITS = new Set(["Hz", "Ω", "V/Pa"]);
/** Significant figures of a figure or a limit on the review page, in the checks table and in the report. */
const FIGURE_DIGITS = 4;

export function formatFigure(value: unknown, figure: string): string {
  if (typeof value !== "number" || !Number.isFinite(value)) return value === null || value === undefined ? "—" : String(value);
  const unit = figureUnit(figure);
  if (PREFIXED_UNITS.has(unit)) return formatSi(value, unit, FIGURE_DIGITS);
  return `${Number(value.toPrecision(FIGURE_DIGITS))} ${unit}`.trim().replace("-", "−");
}

function limits(check: CheckRow): string {
  const { min, max, figure } = check;
  if (min !== undefined && max !== undefined) return `${formatFigure(min, figure)} to ${formatFigure(max, figure)}`;
  if (min !== undefined) return `≥ ${formatFigure(min, figure)}`;
  return `≤ ${formatFigure(max, figure)}`;
}

/** "Targets met", "1 of 3 targets missed" or "No targets" — the badge the bench, the table and the review show. */
export function ChecksBadge({ allPass, checks }: { allPass: boolean | null; checks: CheckRow[] }) {
  if (allPass === null) return <span className="whitespace-nowrap text-xs text-ink-soft">No targets</span>;
  const missed = checks.filter((c) => !c.pass).length;
  return allPass ? (
    <span data-testid="checks-badge" className="inline-block whitespace-nowrap rounded-full border border-trace/40 bg-trace-light/40 px-2 py-0.5 text-xs font-medium text-ink">
      Targets met
    </span>
  ) : (
    <span data-testid="checks-badge" className="inline-block whitespace-nowrap rounded-full border border-caution/40 bg-caution-bg px-2 py-0.5 text-xs font-medium text-caution">
      {missed || checks.length} of {checks.length || 1} target{checks.length === 1 ? "" : "s"} missed
    </span>
  );
}

/** The revision's target checks, one row per target, with the value the engine found. */
export function ChecksTable({ checks, error }: { checks: CheckRow[]; error?: string | null }) {
  if (error) return <p className="text-sm text-caution">The engine could not run this revision, so its targets count as missed: {error}</p>;
  if (checks.length === 0) return <p className="text-sm text-ink-soft">This design has no targets yet.</p>;
  return (
    <table className="w-full text-sm" aria-label="Target checks">
      <thead>
        <tr className="border-b border-rule text-left text-xs uppercase tracking-wide text-ink-soft">
          <th className="py-1 pr-2 font-medium">Figure</th>
          <th className="py-1 pr-2 font-medium">Target</th>
          <th className="py-1 pr-2 font-medium">Value</th>
          <th className="py-1 font-medium">Result</th>
        </tr>
      </thead>
      <tbody>
        {checks.map((check) => (
          <tr key={`${check.figure}-${check.variant ?? ""}-${check.min ?? ""}-${check.max ?? ""}`} className="border-b border-rule/60 align-top">
            <td className="py-1.5 pr-2">
              {figureLabel(check.figure)}
              {check.variant ? <span className="block text-xs text-ink-soft">variant {check.variant}</span> : null}
            </td>
            <td className="py-1.5 pr-2 font-mono text-xs">{limits(check)}</td>
            <td className="py-1.5 pr-2 font-mono text-xs">{formatFigure(check.value, check.figure)}</td>
            <td className={`py-1.5 font-medium ${check.pass ? "text-trace" : "text-caution"}`}>{check.pass ? "Met" : "Missed"}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
