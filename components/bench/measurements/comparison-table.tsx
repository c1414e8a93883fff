/**
 * The table beside the plot for one measurement against the simulation: how the two were lined up (a response's
 * level offset at the alignment frequency; a noise spectrum is compared as measured), the largest deviation inside
 * the chosen band and where it lies, and how many points were compared.
 */
import type { ChosenComparison } from "./measurement-overlay";

export const signedDb = (v: number, digits = 2) => (v >= 0 ? `+${v.toFixed(digits)}` : `−${Math.abs(v).toFixed(digits)}`);
export const hzText = (v: number) => (v >= 1000 ? `${(v / 1000).toPrecision(3)} kHz` : `${v.toPrecision(3)} Hz`);

const th = "pr-4 text-left font-medium text-ink-soft";

export function ComparisonTable({ chosen }: { chosen: ChosenComparison }) {
  if (!chosen.result.ok) return null;
  const c = chosen.result.comparison;
  const noise = chosen.kind === "noise_spectrum";
  return (
    <table className="text-sm" aria-label="Measurement against simulation" data-testid="comparison-table" data-kind={chosen.kind}>
      <tbody>
        {chosen.kind === "frequency_response" && chosen.result.ok ? (
          <tr>
            <th className={th}>Level offset at {hzText(chosen.result.comparison.alignHz)}</th>
            <td className="font-mono" data-testid="offset-db">{signedDb(chosen.result.comparison.offset_db)} dB</td>
          </tr>
        ) : (
          <tr>
            <th className={th}>Level offset</th>
            <td className="text-xs" data-testid="offset-db">none: noise is compared as measured, in dBV/√Hz</td>
          </tr>
        )}
        <tr>
          <th className={th}>
            Largest deviation, {hzText(c.band.fromHz)} – {hzText(c.band.toHz)}
          </th>
          <td className="font-mono" data-testid="max-deviation-db">{c.max ? `${signedDb(c.max.deviation_db)} dB` : "no points in the band"}</td>
        </tr>
        <tr>
          <th className={th}>At</th>
          <td className="font-mono" data-testid="max-deviation-hz">{c.max ? hzText(c.max.frequency) : "—"}</td>
        </tr>
        <tr>
          <th className={th}>Points compared</th>
          <td className="font-mono">{c.frequency.length}</td>
        </tr>
        {noise ? (
          <tr>
            <th className={th}>Drawn on</th>
            <td className="text-xs">the Noise plot, beside the simulated total</td>
          </tr>
        ) : null}
      </tbody>
    </table>
  );
}
