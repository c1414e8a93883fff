"use client";
/** The bench's caution: shown whenever the design holds voltages that can hurt (see document/hazards.ts). */
import type { BenchCircuit } from "./document/circuit";
import { type HazardReason, hazardReasons } from "./document/hazards";

function describe(reason: HazardReason): string {
  if (reason.kind === "triode") return `${reason.part} is a valve: its supply is lethal`;
  if (reason.kind === "supply") return `${reason.part} supplies ${Math.round(reason.volts)} V`;
  return `net ${reason.net} sits at ${Math.round(reason.volts)} V DC`;
}

export function CautionBanner({
  circuit,
  opNets,
}: {
  circuit: BenchCircuit;
  opNets?: Record<string, number | null> | null;
}) {
  const reasons = hazardReasons(circuit, opNets);
  if (reasons.length === 0) return null;
  return (
    <div
      role="note"
      aria-label="Caution"
      data-testid="caution-banner"
      className="flex flex-wrap items-baseline gap-x-2 border-b border-caution/40 bg-caution-bg px-4 py-1.5 text-[13px] text-caution"
    >
      <strong className="font-semibold">Caution — lethal voltages.</strong>
      <span>
        {reasons.slice(0, 3).map(describe).join("; ")}
        {reasons.length > 3 ? ` and ${reasons.length - 3} more` : ""}. Capacitors keep their charge after power-off:
        discharge them before touching. Work to your local codes and qualified practice.
      </span>
    </div>
  );
}
