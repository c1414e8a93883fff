/**
 * Starting points: generic front ends of the trade, with invented values (Larkfield Acoustics' bench defaults, not
 * any product's). Each is a complete backplate/circuit file; `starting-points.ts` adds the drawing.
 */
import type { BenchCircuit } from "../document/circuit";

type Part = Omit<BenchCircuit["parts"][number], "enabled" | "tolerance" | "tolerance_distribution" | "noiseless"> &
  Partial<BenchCircuit["parts"][number]>;

const file = (title: string, parameters: Record<string, string>, parts: Part[], plus = "out") => ({
  format: "backplate/circuit" as const,
  version: 1 as const,
  title,
  parameters,
  parts,
  output: { plus, minus: "0" },
  variants: [],
  analyses: {
    op: {},
    ac: { from: 10, to: 100000, points_per_decade: 20 },
    noise: { from: 20, to: 20000, points_per_decade: 20 },
  },
});

const AC_ANALYSES = { from: 10, to: 100000, points_per_decade: 20 };
export { AC_ANALYSES };

export const EXTERNALLY_POLARISED_JFET = file(
  "Externally polarised capsule, JFET follower, transformerless output",
  { VPOL: "60", RB: "1G", VDD: "12" },
  [
    { id: "V1", kind: "vsource", role: "supply", pins: { p: "pol", n: "0" }, values: { dc: "VPOL" } },
    { id: "R1", kind: "resistor", pins: { a: "pol", b: "dia" }, values: { resistance: "RB" } },
    {
      id: "MIC1",
      kind: "capsule",
      pins: { diaphragm: "dia", backplate: "0" },
      values: { capacitance: "50p", strain_per_pa: "3e-4" },
    },
    { id: "C1", kind: "capacitor", pins: { a: "dia", b: "g" }, values: { capacitance: "1n" } },
    { id: "R2", kind: "resistor", pins: { a: "g", b: "0" }, values: { resistance: "RB" } },
    { id: "J1", kind: "jfet", pins: { d: "vdd", g: "g", s: "s" }, values: { type: "n", idss: "4m", pinch_off: "-2" } },
    { id: "R3", kind: "resistor", pins: { a: "s", b: "0" }, values: { resistance: "2k2" } },
    { id: "V2", kind: "vsource", role: "supply", pins: { p: "vdd", n: "0" }, values: { dc: "VDD" } },
    { id: "C2", kind: "capacitor", pins: { a: "s", b: "out" }, values: { capacitance: "22u" } },
    { id: "IN1", kind: "load", pins: { p: "out", n: "0" }, values: { resistance: "2k4" } },
  ],
);

export const ELECTRET_JFET = file("Electret capsule with a JFET", { VDD: "5" }, [
  {
    id: "MIC1",
    kind: "capsule",
    pins: { diaphragm: "g", backplate: "0" },
    values: { capacitance: "10p", strain_per_pa: "1e-4", electret_voltage: "150" },
  },
  { id: "R1", kind: "resistor", pins: { a: "g", b: "0" }, values: { resistance: "1G" } },
  { id: "J1", kind: "jfet", pins: { d: "d", g: "g", s: "0" }, values: { type: "n", idss: "500u", pinch_off: "-0.6" } },
  { id: "R2", kind: "resistor", pins: { a: "vdd", b: "d" }, values: { resistance: "2k2" } },
  { id: "V1", kind: "vsource", role: "supply", pins: { p: "vdd", n: "0" }, values: { dc: "VDD" } },
  { id: "C1", kind: "capacitor", pins: { a: "d", b: "out" }, values: { capacitance: "10u" } },
  { id: "IN1", kind: "load", pins: { p: "out", n: "0" }, values: { resistance: "10k" } },
]);

export const VALVE_TRANSFORMER = file(
  "Valve impedance converter with an output transformer",
  { VPOL: "60", HT: "120" },
  [
    { id: "V1", kind: "vsource", role: "supply", pins: { p: "pol", n: "0" }, values: { dc: "VPOL" } },
    { id: "R1", kind: "resistor", pins: { a: "pol", b: "dia" }, values: { resistance: "1G" } },
    {
      id: "MIC1",
      kind: "capsule",
      pins: { diaphragm: "dia", backplate: "0" },
      values: { capacitance: "50p", strain_per_pa: "3e-4" },
    },
    { id: "C1", kind: "capacitor", pins: { a: "dia", b: "g" }, values: { capacitance: "470p" } },
    { id: "R2", kind: "resistor", pins: { a: "g", b: "0" }, values: { resistance: "250M" } },
    { id: "VT1", kind: "triode", pins: { a: "a", g: "g", k: "k" }, values: { mu: "30", k: "0.3m" } },
    { id: "R3", kind: "resistor", pins: { a: "k", b: "0" }, values: { resistance: "1k5" } },
    { id: "R4", kind: "resistor", pins: { a: "ht", b: "a" }, values: { resistance: "47k" } },
    { id: "V2", kind: "vsource", role: "supply", pins: { p: "ht", n: "0" }, values: { dc: "HT" } },
    { id: "C2", kind: "capacitor", pins: { a: "a", b: "pri" }, values: { capacitance: "1u" } },
    {
      id: "T1",
      kind: "transformer",
      pins: { p1: "pri", p2: "0", s1: "out", s2: "0" },
      values: { ratio: "0.1", primary_inductance: "60", primary_resistance: "800" },
    },
    { id: "IN1", kind: "load", pins: { p: "out", n: "0" }, values: { resistance: "1k2" } },
  ],
);

export const VALVE_BIPOLAR = file("Valve with a bipolar follower", { VPOL: "60", HT: "120" }, [
  { id: "V1", kind: "vsource", role: "supply", pins: { p: "pol", n: "0" }, values: { dc: "VPOL" } },
  { id: "R1", kind: "resistor", pins: { a: "pol", b: "dia" }, values: { resistance: "1G" } },
  {
    id: "MIC1",
    kind: "capsule",
    pins: { diaphragm: "dia", backplate: "0" },
    values: { capacitance: "50p", strain_per_pa: "1e-4" },
  },
  { id: "C1", kind: "capacitor", pins: { a: "dia", b: "g" }, values: { capacitance: "470p" } },
  { id: "R2", kind: "resistor", pins: { a: "g", b: "0" }, values: { resistance: "250M" } },
  { id: "VT1", kind: "triode", pins: { a: "a", g: "g", k: "k" }, values: { mu: "30", k: "0.3m" } },
  { id: "R3", kind: "resistor", pins: { a: "k", b: "0" }, values: { resistance: "1k5" } },
  { id: "R4", kind: "resistor", pins: { a: "ht", b: "a" }, values: { resistance: "47k" } },
  { id: "V2", kind: "vsource", role: "supply", pins: { p: "ht", n: "0" }, values: { dc: "HT" } },
  { id: "Q1", kind: "bjt", pins: { c: "ht", b: "a", e: "e" }, values: { type: "npn", beta: "150" } },
  { id: "R5", kind: "resistor", pins: { a: "e", b: "0" }, values: { resistance: "22k" } },
  { id: "C2", kind: "capacitor", pins: { a: "e", b: "out" }, values: { capacitance: "10u" } },
  { id: "IN1", kind: "load", pins: { p: "out", n: "0" }, values: { resistance: "1k2" } },
]);

export const PHANTOM_JFET = file("Phantom-powered JFET stage", { PHANTOM: "48", RB: "1G" }, [
  { id: "V1", kind: "vsource", role: "supply", pins: { p: "ph", n: "0" }, values: { dc: "PHANTOM" } },
  { id: "R1", kind: "resistor", pins: { a: "ph", b: "line" }, values: { resistance: "3k4" } },
  { id: "R2", kind: "resistor", pins: { a: "line", b: "vdd" }, values: { resistance: "4k7" } },
  { id: "C1", kind: "capacitor", pins: { a: "vdd", b: "0" }, values: { capacitance: "47u" } },
  { id: "R3", kind: "resistor", pins: { a: "vdd", b: "dia" }, values: { resistance: "RB" } },
  {
    id: "MIC1",
    kind: "capsule",
    pins: { diaphragm: "dia", backplate: "0" },
    values: { capacitance: "40p", strain_per_pa: "3e-4" },
  },
  { id: "C2", kind: "capacitor", pins: { a: "dia", b: "g" }, values: { capacitance: "1n" } },
  { id: "R4", kind: "resistor", pins: { a: "g", b: "0" }, values: { resistance: "RB" } },
  { id: "J1", kind: "jfet", pins: { d: "d", g: "g", s: "s" }, values: { type: "n", idss: "3m", pinch_off: "-1.5" } },
  { id: "R5", kind: "resistor", pins: { a: "vdd", b: "d" }, values: { resistance: "6k8" } },
  { id: "R6", kind: "resistor", pins: { a: "s", b: "0" }, values: { resistance: "1k" } },
  { id: "C3", kind: "capacitor", pins: { a: "d", b: "out" }, values: { capacitance: "10u" } },
  { id: "IN1", kind: "load", pins: { p: "out", n: "0" }, values: { resistance: "2k" } },
]);
