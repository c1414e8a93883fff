/**
 * When the bench shows its caution: a net above 60 V DC (the usual extra-low-voltage limit, from memory), a source
 * with role "supply" at 48 V or more (phantom power and up), or a triode (valve supplies). The op's net voltages are
 * used when the results give them; without them, any source whose DC value exceeds 60 V counts.
 */
import { parseFieldValue } from "@/sim/circuit/field";
import type { BenchCircuit } from "./circuit";

/** Extra-low-voltage limit for DC, V (from memory: IEC 61140 / IEC 60449 band I, 60 V ripple-free). */
export const ELV_LIMIT_V = 60;
/** A supply from this voltage up (phantom power is 48 V, IEC 61938) earns the caution. */
export const SUPPLY_CAUTION_V = 48;

export type HazardReason =
  | { kind: "high-net"; net: string; volts: number }
  | { kind: "supply"; part: string; volts: number }
  | { kind: "triode"; part: string };

export function hazardReasons(circuit: BenchCircuit, opNets?: Record<string, number | null> | null): HazardReason[] {
  const reasons: HazardReason[] = [];
  for (const part of circuit.parts) {
    if (!part.enabled) continue;
    if (part.kind === "triode") reasons.push({ kind: "triode", part: part.id });
    if (part.kind !== "vsource" || part.values.dc === undefined) continue;
    const dc = parseFieldValue("vsource", "dc", part.values.dc, circuit.parameters, { part: part.id });
    if (!dc.ok) continue;
    const volts = Math.abs(dc.value as number);
    if (part.role === "supply" && volts >= SUPPLY_CAUTION_V) reasons.push({ kind: "supply", part: part.id, volts });
    else if (!opNets && volts > ELV_LIMIT_V) reasons.push({ kind: "supply", part: part.id, volts });
  }
  for (const [net, volts] of Object.entries(opNets ?? {})) {
    if (typeof volts === "number" && Math.abs(volts) > ELV_LIMIT_V) reasons.push({ kind: "high-net", net, volts });
  }
  return reasons;
}
