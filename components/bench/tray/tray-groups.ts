/**
 * The tray's sections, in Backplate's words, in the order a front end is drawn: capsule and its bias, the impedance
 * converter, passives, sources, then what the output drives. Every kind of the contract appears exactly once.
 */
import type { PartKind } from "@/sim/circuit/types";

export type TrayItem = PartKind | "ground" | "label";

export interface TrayGroup {
  title: string;
  items: TrayItem[];
}

export const TRAY_GROUPS: TrayGroup[] = [
  { title: "Capsule & bias", items: ["capsule", "ground", "label"] },
  { title: "Converters", items: ["jfet", "triode", "bjt"] },
  { title: "Passives", items: ["resistor", "capacitor", "inductor", "transformer"] },
  { title: "Sources", items: ["vsource", "isource", "vcvs", "vccs"] },
  { title: "Output & destination", items: ["cable", "load"] },
];

/** What each tray item is for, shown as its hint. */
export const TRAY_HINTS: Record<TrayItem, string> = {
  capsule: "Two plates: diaphragm and backplate",
  ground: "Joins what it is wired to with net 0",
  label: "Names the net it is wired to",
  jfet: "Junction FET impedance converter",
  triode: "Valve impedance converter",
  bjt: "Bipolar follower or gain stage",
  resistor: "Bias, load and pad resistors",
  capacitor: "Coupling, filter and pad capacitors",
  inductor: "Chokes and filters",
  transformer: "Output transformer (ratio Ns/Np)",
  vsource: "Polarisation or supply (role: supply)",
  isource: "Bias current",
  vcvs: "Ideal voltage amplifier model",
  vccs: "Ideal transconductance model",
  cable: "Microphone cable, about 100 pF/m",
  load: "Console or recorder input",
};
