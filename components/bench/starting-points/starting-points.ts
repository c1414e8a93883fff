/**
 * The starting points offered on an empty bench ("Start from…") and by the "New design" form: each a complete
 * circuit file and its drawing. `startingPoint(id)` gives the document; `startingPointFiles()` the circuit and
 * layout as a revision stores them (for a create request).
 */
import { autoLayout } from "../document/auto-layout";
import { normaliseCircuit } from "../document/circuit";
import type { BenchDocument } from "../document/document";
import type { BenchLayout } from "../document/layout";
import { ELECTRET_JFET, EXTERNALLY_POLARISED_JFET, PHANTOM_JFET, VALVE_BIPOLAR, VALVE_TRANSFORMER } from "./circuits";

export interface StartingPoint {
  id: string;
  title: string;
  summary: string;
  circuit: unknown;
}

export const STARTING_POINTS: StartingPoint[] = [
  {
    id: "polarised-jfet",
    title: "Externally polarised capsule, JFET follower",
    summary: "60 V through 1 GΩ, n-JFET source follower, transformerless output into 2.4 kΩ.",
    circuit: EXTERNALLY_POLARISED_JFET,
  },
  {
    id: "electret-jfet",
    title: "Electret capsule with a JFET",
    summary: "Self-polarised capsule on the gate, common-source JFET, 5 V supply.",
    circuit: ELECTRET_JFET,
  },
  {
    id: "valve-transformer",
    title: "Valve impedance converter, output transformer",
    summary: "Triode with cathode bias on 120 V, 10:1 output transformer into 1.2 kΩ.",
    circuit: VALVE_TRANSFORMER,
  },
  {
    id: "valve-bipolar",
    title: "Valve with a bipolar follower",
    summary: "Triode stage direct-coupled to an emitter follower.",
    circuit: VALVE_BIPOLAR,
  },
  {
    id: "phantom-jfet",
    title: "Phantom-powered JFET stage",
    summary: "48 V phantom through its feed resistor, filtered local supply, JFET stage.",
    circuit: PHANTOM_JFET,
  },
];

export function startingPointDocument(point: StartingPoint): BenchDocument {
  const circuit = normaliseCircuit(structuredClone(point.circuit));
  return { circuit, layout: autoLayout(circuit) };
}

/** What a create request sends: `{ circuit, layout }` of a starting point, by id (null when unknown). */
export function startingPointFiles(id: string): { circuit: unknown; layout: BenchLayout } | null {
  const point = STARTING_POINTS.find((p) => p.id === id);
  if (!point) return null;
  const document = startingPointDocument(point);
  return { circuit: document.circuit, layout: document.layout };
}
