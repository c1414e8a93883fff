/** How each kind is called in the bench (Backplate's words; the trade's names for the parts). */
import type { PartKind } from "@/sim/circuit/types";

export const KIND_LABELS: Record<PartKind, string> = {
  resistor: "Resistor",
  capacitor: "Capacitor",
  inductor: "Inductor",
  vsource: "Voltage source",
  isource: "Current source",
  vcvs: "Voltage-controlled voltage source",
  vccs: "Voltage-controlled current source",
  capsule: "Capsule",
  jfet: "JFET",
  triode: "Triode",
  bjt: "Bipolar transistor",
  transformer: "Transformer",
  cable: "Cable",
  load: "Input load",
};

/** Pin names spelled out for handle titles and the part sheet. */
export const PIN_LABELS: Record<string, string> = {
  a: "a",
  b: "b",
  p: "+",
  n: "−",
  cp: "control +",
  cn: "control −",
  diaphragm: "diaphragm",
  backplate: "backplate",
  d: "drain",
  g: "gate",
  s: "source",
  c: "collector",
  e: "emitter",
  k: "cathode",
  p1: "primary 1 (dot)",
  p2: "primary 2",
  s1: "secondary 1 (dot)",
  s2: "secondary 2",
  ref: "shield",
};

export function pinLabel(kind: PartKind, pin: string): string {
  if (kind === "triode" && pin === "a") return "anode";
  if (kind === "triode" && pin === "g") return "grid";
  if (kind === "bjt" && pin === "b") return "base";
  return PIN_LABELS[pin] ?? pin;
}
