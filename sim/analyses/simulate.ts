/**
 * Run what an elaborated circuit asks for: `op`, `ac` and `noise` when requested, the figures always (they need
 * only the operating point and a few small-signal solves; self_noise_dba_spl needs the noise analysis too), and a
 * Monte Carlo `spread` over the tolerances (spread.ts) that repeats the same analyses per run on the same compiled
 * structure. The operating point an analysis linearises at is solved at that analysis's temperature.
 */
import { expandFrequencies as expandFrequencyRequest } from "../circuit/frequencies";
import {
  type AnalysisRequests,
  DEFAULT_TEMPERATURE_K,
  type ElaboratedCircuit,
  type FrequencyRequest,
} from "../circuit/types";
import type { SimulationResult, SpreadResult } from "../results";
import { runAc } from "./ac";
import { type CompiledCircuit, compileCircuit } from "./compile";
import { computeFigures } from "./figures";
import { runNoise } from "./noise";
import { AdjointNoiseSystem } from "./noise-adjoint";
import { selfNoiseDbaSpl } from "./noise-figures";
import { type OperatingPoint, OperatingPointSolver, reportOperatingPoint } from "./op";
import { SmallSignalModel } from "./small-signal";
import { runSpread } from "./spread";
import { SpreadSweep } from "./spread-sweep";
import type { RunControl } from "./transient";
import { solveLargeSignal } from "./transient-large-signal";

/** Contract: capsules are driven at 1 Pa unless the ac analysis says otherwise. */
export const DEFAULT_PRESSURE_PA = 1;

/**
 * The frequencies of a request (sim/circuit/frequencies.ts: the one expansion, also behind the size limit's
 * count) as the plain array the analyses and their JSON results take.
 */
function expandFrequencies(request: FrequencyRequest): number[] {
  let list = expanded.get(request);
  if (!list) {
    list = Array.from(expandFrequencyRequest(request));
    expanded.set(request, list);
  }
  return list;
}

/**
 * Expanded lists by request: a spread repeats the same requests a thousand times. The lists are read, never
 * written, by the analyses; the JSON results copy them (ac.ts), so sharing one is safe.
 */
const expanded = new WeakMap<FrequencyRequest, number[]>();

export interface SolveOptions {
  /** produce the `op` document when op is requested (Monte Carlo runs skip it) */
  reportOp: boolean;
  /** start every operating point from this solution (a Monte Carlo run starts from the nominal one) */
  warmStart?: Float64Array;
  /**
   * run transient, distortion and ripple when asked (the nominal pass; a Monte Carlo run repeats the small-signal
   * analyses only), with a Web Worker's progress callback and cancellation check
   */
  largeSignal?: RunControl;
  /** a Monte Carlo run's reduced AC sweep (spread-sweep.ts), shared by the runs of one spread */
  spreadSweep?: SpreadSweep;
}

/** One pass of the requested analyses on a compiled circuit with the values its parts hold now. */
export function solveAnalyses(
  compiled: CompiledCircuit,
  solver: OperatingPointSolver,
  analyses: AnalysisRequests,
  options: SolveOptions,
): { result: SimulationResult; nominal: OperatingPoint; model: SmallSignalModel } {
  const points = new Map<number, OperatingPoint>();
  const operatingPointAt = (temperature: number): OperatingPoint => {
    let op = points.get(temperature);
    if (!op) {
      const warm = options.warmStart ?? points.values().next().value?.x;
      op = solver.solve({ temperature, initial: warm });
      points.set(temperature, op);
    }
    return op;
  };
  const result: SimulationResult = { figures: {} };
  if (analyses.op && options.reportOp) {
    result.op = reportOperatingPoint(compiled, operatingPointAt(analyses.op.temperature));
  }
  const acTemperature = analyses.ac?.temperature ?? analyses.op?.temperature ?? DEFAULT_TEMPERATURE_K;
  const nominal = operatingPointAt(acTemperature);
  const model = new SmallSignalModel(compiled, nominal);
  const pressure = analyses.ac?.pressure ?? DEFAULT_PRESSURE_PA;
  if (analyses.ac) {
    result.ac = runAc(model, expandFrequencies(analyses.ac.frequencies), pressure, options.spreadSweep);
  }
  // The sweep just solved brackets the corners (corners.ts): far fewer single-frequency solves than a search.
  result.figures = computeFigures(model, pressure, result.ac);
  if (analyses.noise) {
    const adjoint = new AdjointNoiseSystem(compiled, operatingPointAt(analyses.noise.temperature));
    result.noise = runNoise(adjoint, expandFrequencies(analyses.noise.frequencies));
    result.figures.self_noise_dba_spl = selfNoiseDbaSpl(
      result.noise.rms_a_weighted,
      result.figures.sensitivity_v_per_pa,
    );
  }
  if (options.largeSignal) solveLargeSignal(compiled, operatingPointAt, analyses, result, options.largeSignal);
  return { result, nominal, model };
}

export function simulate(circuit: ElaboratedCircuit, control: RunControl = {}): SimulationResult {
  const compiled = compileCircuit(circuit);
  const solver = new OperatingPointSolver(compiled);
  const { spread, ...analyses } = circuit.analyses;
  const { result, nominal, model } = solveAnalyses(compiled, solver, analyses, {
    reportOp: true,
    largeSignal: control,
  });
  if (spread) result.spread = spreadAround(compiled, solver, analyses, spread, { nominal, model });
  return result;
}

/**
 * The Monte Carlo spread of the small-signal analyses around a nominal pass: every run warm-starts its operating
 * point from the nominal one, and its AC sweeps share one reduced sweep built from the nominal model.
 */
export function spreadAround(
  compiled: CompiledCircuit,
  solver: OperatingPointSolver,
  analyses: Omit<AnalysisRequests, "spread">,
  spread: { runs: number; seed: number },
  nominal: { nominal: OperatingPoint; model: SmallSignalModel },
): SpreadResult {
  const spreadSweep = new SpreadSweep(nominal.model);
  return runSpread(
    compiled,
    spread,
    (warmStart) => solveAnalyses(compiled, solver, analyses, { reportOp: false, warmStart, spreadSweep }).result,
    nominal.nominal.x,
  );
}
