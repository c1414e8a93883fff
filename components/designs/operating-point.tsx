import type { OpResult } from "@/sim";
import { formatSi } from "@/components/bench/results/format";

/** Net voltages and each active device's region and bias current from the DC operating point. */
export function OperatingPoint({ op }: { op: OpResult }) {
  const nets = Object.entries(op.nets).filter(([name]) => name !== "0");
  const devices = Object.entries(op.parts).filter(([, p]) => typeof p.region === "string");
  const current = (p: Record<string, unknown>) => (typeof p.id === "number" ? p.id : typeof p.ia === "number" ? p.ia : typeof p.ic === "number" ? p.ic : null);
  return (
    <div className="space-y-3 text-sm">
      <ul className="grid grid-cols-2 gap-x-4 gap-y-1 font-mono text-xs sm:grid-cols-3">
        {nets.map(([name, v]) => (
          <li key={name} className="flex justify-between gap-2 border-b border-rule/70 py-0.5">
            <span className="truncate text-ink-soft">{name}</span>
            <span>{formatSi(v, "V")}</span>
          </li>
        ))}
      </ul>
      {devices.length > 0 ? (
        <ul className="space-y-0.5">
          {devices.map(([id, p]) => (
            <li key={id}>
              <span className="font-mono">{id}</span> — {String(p.region)}, {formatSi(current(p), "A")}
              {typeof p.gm === "number" ? `, gm ${formatSi(p.gm, "S")}` : ""}
            </li>
          ))}
        </ul>
      ) : null}
      {op.warnings.length > 0 ? (
        <ul className="rounded border border-caution/40 bg-caution-bg px-3 py-2 text-caution">
          {op.warnings.map((w) => (
            <li key={w.message}>{w.message}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
