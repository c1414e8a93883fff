/**
 * What a part dragged in from the tray starts as: sensible values of the trade for a microphone front end
 * (invented for the demo, each within the usual range), and every pin on a net of its own until it is wired.
 */
import { KIND_SPECS } from "@/sim/circuit/kinds";
import type { PartKind } from "@/sim/circuit/types";
import type { BenchPart, RawValue } from "./circuit";

export const DEFAULT_VALUES: Record<PartKind, Record<string, RawValue>> = {
  resistor: { resistance: "10k" },
  capacitor: { capacitance: "100n" },
  inductor: { inductance: "10m" },
  vsource: { dc: "12" },
  isource: { dc: "1m" },
  vcvs: { gain: "1" },
  vccs: { transconductance: "1m" },
  // a large-diaphragm capsule: about 50 pF, and a strain of 3e-4 per pascal
  capsule: { capacitance: "50p", strain_per_pa: "3e-4" },
  jfet: { type: "n", idss: "4m", pinch_off: "-2" },
  triode: { mu: "100", k: "1.5m" },
  bjt: { type: "npn", beta: "200" },
  transformer: { ratio: "0.2", primary_inductance: "100" },
  cable: { length: "5", capacitance_per_m: "100p" },
  // a transformer-coupled console input, about 1.2 kΩ
  load: { resistance: "1k2" },
};

/** A new part of `kind` with id `id`, its pins on fresh nets named after it ("R2_a"). */
export function newPart(kind: PartKind, id: string): BenchPart {
  const pins = Object.fromEntries(KIND_SPECS[kind].pins.map((pin) => [pin, `${id}_${pin}`]));
  const part: BenchPart = {
    id,
    kind,
    pins,
    values: { ...DEFAULT_VALUES[kind] },
    enabled: true,
    tolerance: {},
    tolerance_distribution: "uniform",
    noiseless: false,
  };
  if (kind === "vsource") part.role = "supply";
  return part;
}
