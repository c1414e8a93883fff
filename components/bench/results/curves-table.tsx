"use client";
/** Beside the plot: each curve's figures, so overlays compare as numbers as well as lines. */
import type { Figures } from "@/sim/results";
import { formatFixed, formatSi } from "./format";

export interface CurveRow {
  id: string;
  label: string;
  colour: string;
  dashed?: boolean;
  figures: Figures | null;
  problem?: string;
}

export function CurvesTable({ rows }: { rows: CurveRow[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full whitespace-nowrap text-xs" data-testid="curves-table">
        <thead>
          <tr className="border-b border-rule text-left text-ink-soft">
            <th className="py-1 font-medium">Curve</th>
            <th className="py-1 pl-2 text-right font-medium" title="Sensitivity, dB re 1 V/Pa">
              Sens. dB
            </th>
            <th className="py-1 pl-2 text-right font-medium">Gain 1 kHz</th>
            <th className="py-1 pl-2 text-right font-medium">Low</th>
            <th className="py-1 pl-2 text-right font-medium">High</th>
            <th className="py-1 pl-2 text-right font-medium">Zout</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-b border-rule" data-curve={r.id}>
              <td className="py-0.5 pr-2">
                <span
                  className="mr-1.5 inline-block h-0.5 w-4 align-middle"
                  style={{ background: r.colour, borderTop: r.dashed ? `2px dashed ${r.colour}` : undefined }}
                />
                {r.label}
              </td>
              {r.figures ? (
                <>
                  <td className="pl-2 text-right font-mono">
                    {formatFixed(r.figures.sensitivity_db_re_1v_per_pa as number | null, 2)}
                  </td>
                  <td className="pl-2 text-right font-mono">
                    {formatFixed(r.figures.gain_1khz_db as number | null, 2, "dB")}
                  </td>
                  <td className="pl-2 text-right font-mono">
                    {formatSi(r.figures.low_corner_hz as number | null, "Hz")}
                  </td>
                  <td className="pl-2 text-right font-mono">
                    {formatSi(r.figures.high_corner_hz as number | null, "Hz")}
                  </td>
                  <td className="pl-2 text-right font-mono">
                    {formatSi(r.figures.output_impedance_1khz_ohm as number | null, "Ω")}
                  </td>
                </>
              ) : (
                <td colSpan={5} className="text-caution">
                  {r.problem ?? "did not solve"}
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
