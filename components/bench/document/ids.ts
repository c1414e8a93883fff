/**
 * Fresh ids: designators for parts (R1, C2, J1 — the usual letters of the trade) and short ids for wires, ground
 * symbols, net labels and notes. "Free" means not used by anything in the given set.
 */
import type { PartKind } from "@/sim/circuit/types";

/** Designator letters, common practice (IEEE 315 / IEC 81346 style); invented for the kinds without one. */
export const DESIGNATOR_PREFIX: Record<PartKind, string> = {
  resistor: "R",
  capacitor: "C",
  inductor: "L",
  vsource: "V",
  isource: "I",
  vcvs: "E",
  vccs: "G",
  capsule: "MIC",
  jfet: "J",
  triode: "VT",
  bjt: "Q",
  transformer: "T",
  cable: "W",
  load: "IN",
};

/** The lowest `${prefix}${n}` (n ≥ 1) not in `used`. */
export function nextFreeId(prefix: string, used: Iterable<string>): string {
  const taken = new Set(used);
  for (let n = 1; ; n++) {
    const id = `${prefix}${n}`;
    if (!taken.has(id)) return id;
  }
}

export function nextDesignator(kind: PartKind, used: Iterable<string>): string {
  return nextFreeId(DESIGNATOR_PREFIX[kind], used);
}
