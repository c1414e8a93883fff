/**
 * Test helper: build `ElaboratedCircuit` objects directly (values SI, the contract's defaults filled), so the
 * solver's tests do not depend on the circuit-file parser.
 */
import {
  type AnalysisRequests,
  DEFAULT_TEMPERATURE_K,
  type ElaboratedCircuit,
  type ElaboratedPart,
  GROUND,
  type PartKind,
} from "../circuit/types";

/** The contract's defaults per kind (the elaborator fills the same). */
const DEFAULTS: Partial<Record<PartKind, Record<string, number | string>>> = {
  inductor: { series_resistance: 0 },
  vsource: { dc: 0, ac: 0, ac_phase: 0 },
  isource: { dc: 0, ac: 0, ac_phase: 0 },
  capsule: { electret_voltage: 0, q: 0.7 },
  jfet: { type: "n", lambda: 0, cgs: 0, cgd: 0, fc: 0, igss: 0 },
  triode: { cgk: 0, cga: 0, cak: 0 },
  bjt: { type: "npn", is: 1e-14, beta: 100, beta_r: 1, vaf: Number.POSITIVE_INFINITY, rbb: 0, cpi: 0, cmu: 0 },
  transformer: { leakage_inductance: 0, primary_resistance: 0, secondary_resistance: 0, secondary_capacitance: 0 },
  cable: { capacitance_per_m: 100e-12, resistance_per_m: 0.05, segments: 10 },
  load: { resistance: Number.POSITIVE_INFINITY, capacitance: 0 },
};

export function part(
  id: string,
  kind: PartKind,
  pins: Record<string, string>,
  values: Record<string, number | string> = {},
): ElaboratedPart {
  return {
    id,
    kind,
    pins,
    values: { ...(DEFAULTS[kind] ?? {}), ...values },
    tolerance: {},
    toleranceDistribution: "uniform",
    noiseless: false,
  };
}

export function circuit(
  parts: ElaboratedPart[],
  output: { plus: string; minus?: string },
  analyses: AnalysisRequests = { op: { temperature: DEFAULT_TEMPERATURE_K } },
): ElaboratedCircuit {
  const nets = new Set<string>([GROUND]);
  for (const p of parts) for (const n of Object.values(p.pins)) nets.add(n);
  const sorted = [...nets].filter((n) => n !== GROUND).sort();
  return {
    title: "test circuit",
    parameters: {},
    parts,
    output: { plus: output.plus, minus: output.minus ?? GROUND },
    nets: [GROUND, ...sorted],
    analyses,
    targets: [],
  };
}

/** An ac request over a log grid at the default temperature. */
export function acGrid(from: number, to: number, pointsPerDecade: number, pressure = 1): AnalysisRequests["ac"] {
  return { frequencies: { kind: "grid", from, to, pointsPerDecade }, pressure, temperature: DEFAULT_TEMPERATURE_K };
}
