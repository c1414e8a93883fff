/**
 * Compile an elaborated circuit once: number the unknowns (nets, then each part's extra unknowns), create the
 * devices, declare every matrix position they write, and build the sparse structures of the DC and AC systems
 * (matching, ordering and fill: sim/mna/sparse-structure.ts). Everything a solve needs per iteration or per
 * frequency is typed arrays from here on. A compiled circuit is reused by every operating point and every
 * frequency: devices read their values from their part's `values` at every stamp, so a Monte Carlo run may change
 * those numbers in place and re-solve (warm-started) on the same structure. What is fixed at compile time is only
 * structural: a load's resistance being finite, a BJT's rbb being non-zero, a cable's segment count.
 */
import { type ElaboratedCircuit, GROUND } from "../circuit/types";
import type { Device, UnknownKind } from "../devices/device";
import { DEVICE_KINDS } from "../devices/registry";
import { SimError } from "../errors";
import { PatternBuilder } from "../mna/pattern";
import { SingularMatrixError } from "../mna/singular";
import { compileSparseStructure, type SparseStructure, type SystemKind } from "../mna/sparse-structure";

export interface UnknownInfo {
  kind: UnknownKind;
  /** the net's name for a net unknown */
  net?: string;
  /** the owning part for an extra unknown */
  part?: string;
  label: string;
}

export interface CompiledCircuit {
  circuit: ElaboratedCircuit;
  /** net name → unknown index (ground → −1) */
  netIndex: Map<string, number>;
  unknowns: UnknownInfo[];
  devices: Device[];
  pattern: PatternBuilder;
  dc: SparseStructure;
  ac: SparseStructure;
}

export function compileCircuit(circuit: ElaboratedCircuit): CompiledCircuit {
  const netIndex = new Map<string, number>([[GROUND, -1]]);
  const unknowns: UnknownInfo[] = [];
  const addNet = (net: string) => {
    if (netIndex.has(net)) return;
    netIndex.set(net, unknowns.length);
    unknowns.push({ kind: "voltage", net, label: `net "${net}"` });
  };
  for (const net of circuit.nets) addNet(net);
  for (const part of circuit.parts) for (const net of Object.values(part.pins)) addNet(net);

  const devices: Device[] = [];
  for (const part of circuit.parts) {
    const kind = DEVICE_KINDS[part.kind];
    const pins: Record<string, number> = {};
    for (const [pin, net] of Object.entries(part.pins)) pins[pin] = netIndex.get(net)!;
    const extra: number[] = [];
    for (const u of kind.extraUnknowns(part)) {
      extra.push(unknowns.length);
      unknowns.push({ kind: u.kind, part: part.id, label: `${part.id} ${u.label}` });
    }
    devices.push(kind.create(part, { pins, extra }));
  }
  for (const net of [circuit.output.plus, circuit.output.minus]) {
    if (!netIndex.has(net)) {
      throw new SimError("unknown_output_net", `output net "${net}" is not connected to any part`, { net });
    }
  }

  const pattern = new PatternBuilder(unknowns.length);
  for (const d of devices) d.declare(pattern);
  // Every node row may carry gmin during gmin stepping: reserve its diagonal (weak, it is usually 0).
  unknowns.forEach((u, i) => {
    if (u.kind === "voltage") pattern.entry(i, i, { weak: true });
  });
  const structure = (kind: SystemKind) => {
    try {
      return compileSparseStructure(pattern, kind);
    } catch (e) {
      if (e instanceof SingularMatrixError) throw singularCircuitError(unknowns, e.unknown, kind);
      throw e;
    }
  };
  return { circuit, netIndex, unknowns, devices, pattern, dc: structure("dc"), ac: structure("ac") };
}

/** A `SimError("singular_circuit")` naming the net or part behind an undetermined unknown. */
export function singularCircuitError(unknowns: UnknownInfo[], index: number, where: SystemKind | "ac-solve"): SimError {
  const u = unknowns[index];
  const analysis = where === "dc" ? "the DC operating point" : "the small-signal (AC) analysis";
  if (!u) return new SimError("singular_circuit", `the circuit equations are singular in ${analysis}`);
  if (u.net !== undefined) {
    return new SimError(
      "singular_circuit",
      `the voltage of net "${u.net}" is not determined in ${analysis}: give it a path to ground (a resistor, say) or check that it is not isolated between capacitors or current sources`,
      { net: u.net },
    );
  }
  return new SimError(
    "singular_circuit",
    `${u.label} is not determined in ${analysis}: check ${u.part} for a loop of voltage sources or inductors, or a source shorted across itself`,
    { part: u.part },
  );
}
