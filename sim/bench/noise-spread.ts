/**
 * Benchmark rows for the noise analysis and the Monte Carlo spread (no mathjs baseline: mathjs has no noise
 * analysis or Monte Carlo to compare with; their mathjs fields are null and say so).
 * - noise: the demo microphone over 20 Hz – 20 kHz at 40 points per decade from its operating point — building
 *   the adjoint system and one adjoint solve per frequency (TARGET_NOISE_MS);
 * - spread: SPREAD_RUNS runs of the demo, each a warm-started operating point on the compiled structure, a
 *   SPREAD_AC_POINTS-point AC sweep and the figures, plus the statistics (TARGET_SPREAD_MS).
 */
import { compileCircuit } from "../analyses/compile";
import { runNoise } from "../analyses/noise";
import { AdjointNoiseSystem } from "../analyses/noise-adjoint";
import { OperatingPointSolver } from "../analyses/op";
import { solveAnalyses, spreadAround } from "../analyses/simulate";
import type { AnalysisRequests, ElaboratedCircuit } from "../circuit/types";

/** Median and best (fastest) of `repeats` timed runs after `warmup` untimed ones, ms: the machine is shared, so the
 * median moves with other builds' load and the best run is closer to what the code costs on a quiet core. */
function timed(run: () => void, warmup: number, repeats: number): { median: number; best: number } {
  for (let i = 0; i < warmup; i++) run();
  const samples: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    run();
    samples.push(performance.now() - start);
  }
  samples.sort((a, b) => a - b);
  const mid = Math.floor(samples.length / 2);
  return { median: samples.length % 2 ? samples[mid] : (samples[mid - 1] + samples[mid]) / 2, best: samples[0] };
}

export const TARGET_NOISE_MS = 1;
export const TARGET_SPREAD_MS = 500;
export const SPREAD_RUNS = 1000;
export const SPREAD_AC_POINTS = 200;
const NOISE_POINTS_PER_DECADE = 40;

export interface ExtraBenchCase {
  name: string;
  nets: number;
  points: number;
  median_ms: number;
  /** fastest of the timed runs */
  best_ms: number;
  mathjs_median_ms: null;
  ratio: null;
  note: string;
}

export function noiseCase(name: string, circuit: ElaboratedCircuit): ExtraBenchCase {
  const compiled = compileCircuit(circuit);
  const op = new OperatingPointSolver(compiled).solve();
  const decades = 3; // 20 Hz … 20 kHz
  const count = decades * NOISE_POINTS_PER_DECADE + 1;
  const frequencies = Array.from({ length: count }, (_, i) => 20 * 10 ** (i / NOISE_POINTS_PER_DECADE));
  const ms = timed(() => runNoise(new AdjointNoiseSystem(compiled, op), frequencies), 20, 101);
  return {
    name,
    nets: circuit.nets.length - 1,
    points: count,
    median_ms: ms.median,
    best_ms: ms.best,
    mathjs_median_ms: null,
    ratio: null,
    note: "no mathjs baseline (mathjs has no noise analysis)",
  };
}

export function spreadCase(name: string, circuit: ElaboratedCircuit): ExtraBenchCase {
  const compiled = compileCircuit(circuit);
  const solver = new OperatingPointSolver(compiled);
  const frequencies = Array.from({ length: SPREAD_AC_POINTS }, (_, i) => 10 ** ((5 * i) / (SPREAD_AC_POINTS - 1)));
  const analyses: AnalysisRequests = {
    op: { temperature: 298.15 },
    ac: { frequencies: { kind: "list", frequencies }, pressure: 1, temperature: 298.15 },
  };
  const nominal = solveAnalyses(compiled, solver, analyses, { reportOp: false });
  const run = () => spreadAround(compiled, solver, analyses, { runs: SPREAD_RUNS, seed: 1 }, nominal);
  const ms = timed(run, 1, 5);
  return {
    name,
    nets: circuit.nets.length - 1,
    points: SPREAD_AC_POINTS,
    median_ms: ms.median,
    best_ms: ms.best,
    mathjs_median_ms: null,
    ratio: null,
    note: `${SPREAD_RUNS} runs, each op + ${SPREAD_AC_POINTS}-point ac + figures; no mathjs baseline (no Monte Carlo in mathjs)`,
  };
}
