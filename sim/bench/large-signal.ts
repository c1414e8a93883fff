/**
 * Large-signal bench rows (`npm run bench`; also `tsx sim/bench/large-signal.ts` on its own):
 *   - `max_spl_db` of the demo microphone: the full bisection (0.5 % and 1 %, 40–160 dB to 0.1 dB), every level a
 *     settled distortion run from the periodic start; TARGET_MAX_SPL_MS;
 *   - a 100 ms transient of the demo circuit at audio resolution (largest step 1/48 kHz, a 1 kHz tone at 94 dB
 *     SPL); TARGET_TRANSIENT_MS.
 * Median and best of N after one warm-up run (the machine is shared with other builds; timing.ts).
 */
import { readFileSync } from "node:fs";
import { compileCircuit } from "../analyses/compile";
import { phasorSolution, Drive } from "../analyses/drive";
import { findMaxSpl } from "../analyses/max-spl";
import { OperatingPointSolver } from "../analyses/op";
import { TransientRun } from "../analyses/transient";
import { elaborate } from "../circuit/elaborate";
import type { ElaboratedCircuit } from "../circuit/types";
import { timeMs } from "./timing";

export const TARGET_MAX_SPL_MS = 2000;
export const TARGET_TRANSIENT_MS = 300;
const AUDIO_STEP_S = 1 / 48_000;
const TRANSIENT_STOP_S = 0.1;

export interface LargeSignalBenchCase {
  name: string;
  nets: number;
  points: number;
  median_ms: number;
  best_ms: number;
  repeats: number;
  note: string;
}

export function maxSplCase(circuit: ElaboratedCircuit, repeats = 5): LargeSignalBenchCase {
  const compiled = compileCircuit(circuit);
  const op = new OperatingPointSolver(compiled).solve();
  let result = { max_spl_db: null as number | null, evaluations: 0 };
  const timing = timeMs(
    () => {
      const drivers = compiled.devices.filter((d) => d.part.kind === "capsule");
      const unitPhasor = phasorSolution(compiled, op, 1000, drivers, 1);
      result = findMaxSpl({ compiled, op, frequency: 1000, mode: "spl", unitPhasor });
    },
    { warmup: 1, repeats },
  );
  return {
    name: "demo-microphone max_spl_db (bisection)",
    nets: circuit.nets.length - 1,
    points: result.evaluations,
    median_ms: timing.median,
    best_ms: timing.best,
    repeats: timing.repeats,
    note: `max_spl_db ${result.max_spl_db?.toFixed(2)} dB SPL from ${result.evaluations} levels; target < ${TARGET_MAX_SPL_MS} ms`,
  };
}

export function transientCase(circuit: ElaboratedCircuit, repeats = 9): LargeSignalBenchCase {
  const compiled = compileCircuit(circuit);
  const op = new OperatingPointSolver(compiled).solve();
  const drive = new Drive({ shape: "sine", frequency: 1000, splDb: 94 }, circuit.parts);
  let points = 0;
  const timing = timeMs(
    () => {
      const run = new TransientRun(compiled, op, { start: "op", maxStep: AUDIO_STEP_S, drive });
      points = 0;
      run.advance(TRANSIENT_STOP_S, () => {
        points++;
      });
    },
    { warmup: 1, repeats },
  );
  return {
    name: "demo-microphone 100 ms transient",
    nets: circuit.nets.length - 1,
    points,
    median_ms: timing.median,
    best_ms: timing.best,
    repeats: timing.repeats,
    note: `largest step 1/48 kHz, 1 kHz at 94 dB SPL; target < ${TARGET_TRANSIENT_MS} ms`,
  };
}

export function largeSignalCases(circuit: ElaboratedCircuit): LargeSignalBenchCase[] {
  return [maxSplCase(circuit), transientCase(circuit)];
}

function demo(): ElaboratedCircuit {
  return elaborate(JSON.parse(readFileSync(new URL("../examples/demo-microphone.json", import.meta.url), "utf8")));
}

if (process.argv[1]?.endsWith("large-signal.ts")) {
  for (const c of largeSignalCases(demo())) {
    console.log(
      `${c.name.padEnd(42)} median ${c.median_ms.toFixed(1)} ms, best ${c.best_ms.toFixed(1)} ms (N = ${c.repeats}, ${c.points} points) — ${c.note}`,
    );
  }
}
