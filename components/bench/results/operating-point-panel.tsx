"use client";
/**
 * The operating point: every net's DC voltage, each device's region and small-signal values, and the warnings —
 * each naming a part links to it on the canvas through `onSelectPart`.
 */
import type { OpResult, SimWarning } from "@/sim/results";
import { formatSi } from "./format";

/** Units of the operating-point values the engine reports (contract: op.parts.*). */
const OP_UNITS: Record<string, string> = {
  current: "A",
  id: "A",
  ia: "A",
  ic: "A",
  ib: "A",
  gm: "S",
  gds: "S",
  rp: "Ω",
  rpi: "Ω",
  ro: "Ω",
  polarisation: "V",
};

export function WarningsList({
  warnings,
  onSelectPart,
}: {
  warnings: SimWarning[];
  onSelectPart?: (id: string) => void;
}) {
  if (warnings.length === 0)
    return <p className="text-sm text-ink-soft">No warnings: every device is where it was meant to be.</p>;
  return (
    <ul className="space-y-1.5" aria-label="Warnings" data-testid="warnings">
      {warnings.map((w) => (
        <li
          key={`${w.part ?? w.net ?? ""}:${w.message}`}
          className="rounded border border-caution/40 bg-caution-bg px-2 py-1 text-sm text-ink"
        >
          {w.message}
          {w.part && onSelectPart && (
            <button
              type="button"
              className="ml-2 text-xs font-medium text-caution underline"
              onClick={() => onSelectPart(w.part as string)}
            >
              Show {w.part}
            </button>
          )}
        </li>
      ))}
    </ul>
  );
}

export function OperatingPointPanel({
  op,
  warnings,
  onSelectPart,
}: {
  op: OpResult;
  warnings: SimWarning[];
  onSelectPart?: (id: string) => void;
}) {
  const nets = Object.entries(op.nets)
    .filter(([n]) => n !== "0")
    .sort(([a], [b]) => a.localeCompare(b));
  const devices = Object.entries(op.parts);
  return (
    <section
      aria-label="Operating point"
      className="grid grid-cols-1 gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.4fr)]"
    >
      <div>
        <h3 className="mb-1 text-sm font-semibold">Net voltages</h3>
        <table className="w-full text-sm" data-testid="net-voltages">
          <tbody>
            {nets.map(([net, v]) => (
              <tr key={net} className="border-b border-rule">
                <th scope="row" className="py-0.5 text-left font-mono font-normal text-ink-soft">
                  {net}
                </th>
                <td className="py-0.5 text-right font-mono">{formatSi(v, "V", 4)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="space-y-3">
        <h3 className="mb-1 text-sm font-semibold">Parts at the operating point</h3>
        <ul className="space-y-1 text-sm" data-testid="device-states">
          {devices.map(([id, values]) => (
            <li key={id} className="flex flex-wrap items-baseline gap-x-3 border-b border-rule pb-1">
              {onSelectPart ? (
                <button
                  type="button"
                  className="font-mono font-semibold text-trace underline-offset-2 hover:underline"
                  onClick={() => onSelectPart(id)}
                >
                  {id}
                </button>
              ) : (
                <span className="font-mono font-semibold">{id}</span>
              )}
              {Object.entries(values).map(([k, v]) => (
                <span key={k} className="font-mono text-xs text-ink-soft">
                  {k} {typeof v === "number" ? formatSi(v, OP_UNITS[k] ?? "") : (v ?? "—")}
                </span>
              ))}
            </li>
          ))}
        </ul>
        <h3 className="text-sm font-semibold">Warnings</h3>
        <WarningsList warnings={warnings} onSelectPart={onSelectPart} />
      </div>
    </section>
  );
}
