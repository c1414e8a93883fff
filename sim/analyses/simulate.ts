/**
 * Run what an elaborated circuit asks for: `op` and `ac` when requested, and the figures always (they need only
 * the operating point and a few small-signal solves). The operating point an analysis linearises at is solved
 * at that analysis's temperature.
 */
import { DEFAULT_TEMPERATURE_K, type ElaboratedCircuit } from "../circuit/types";
import type { SimulationResult } from "../results";
import { runAc } from "./ac";
import { compileCircuit } from "./compile";
import { computeFigures } from "./figures";
import { expandFrequencies } from "./frequency-grid";
import { type OperatingPoint, OperatingPointSolver, reportOperatingPoint } from "./op";
import { SmallSignalModel } from "./small-signal";

/** Contract: capsules are driven at 1 Pa unless the ac analysis says otherwise. */
export const DEFAULT_PRESSURE_PA = 1;

export function simulate(circuit: ElaboratedCircuit): SimulationResult {
  const compiled = compileCircuit(circuit);
  const solver = new OperatingPointSolver(compiled);
  const points = new Map<number, OperatingPoint>();
  const operatingPointAt = (temperature: number): OperatingPoint => {
    let op = points.get(temperature);
    if (!op) {
      const warm = points.values().next().value;
      op = solver.solve({ temperature, initial: warm?.x });
      points.set(temperature, op);
    }
    return op;
  };
  const { analyses } = circuit;
  const result: SimulationResult = { figures: {} };
  if (analyses.op) result.op = reportOperatingPoint(compiled, operatingPointAt(analyses.op.temperature));
  const acTemperature = analyses.ac?.temperature ?? analyses.op?.temperature ?? DEFAULT_TEMPERATURE_K;
  const model = new SmallSignalModel(compiled, operatingPointAt(acTemperature));
  const pressure = analyses.ac?.pressure ?? DEFAULT_PRESSURE_PA;
  if (analyses.ac) result.ac = runAc(model, expandFrequencies(analyses.ac.frequencies), pressure);
  result.figures = computeFigures(model, pressure);
  return result;
}
