/**
 * `npm run bench`: AC sweeps (1,000 log-spaced points, 1 Hz – 100 kHz) of a 40-net RC ladder and of the demo
 * microphone, and the demo's DC operating point — each timed in-process (median of repeated runs after warm-up)
 * beside the same matrices solved by the dense typed-array LU and by mathjs `lusolve`. mathjs is too slow for
 * 1,000 points per run: it is timed on MATHJS_POINTS points and scaled per point to the full sweep (stated in the
 * output). Beside each median the best of the same runs is printed (best-of-N, N = REPEATS): the machine is shared
 * with other builds, and the best run shows what the code costs without their load. `--json` prints
 * { "cases": [...] } only.
 *
 * Each case runs in a child process of its own (`--case NAME`, result over IPC): a case timed after another one
 * inherits its heap (mathjs leaves hundreds of megabytes of garbage) and its optimised, by then polymorphic,
 * kernels, which made the later rows depend on which rows ran before them.
 */
import { fork } from "node:child_process";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { lusolve } from "mathjs";
import { runAc } from "../analyses/ac";
import { compileCircuit } from "../analyses/compile";
import { OperatingPointSolver } from "../analyses/op";
import { SmallSignalModel } from "../analyses/small-signal";
import { elaborate } from "../circuit/elaborate";
import type { ElaboratedCircuit } from "../circuit/types";
import { prepareDense, prepareMathjs } from "./baselines";
import { type LargeSignalBenchCase, largeSignalCases, TARGET_MAX_SPL_MS, TARGET_TRANSIENT_MS } from "./large-signal";
import {
  type ExtraBenchCase,
  noiseCase,
  SPREAD_RUNS,
  spreadCase,
  TARGET_NOISE_MS,
  TARGET_SPREAD_MS,
} from "./noise-spread";
import { rcLadder } from "./rc-ladder";
import { medianMs, timeMs } from "./timing";

const SWEEP_POINTS = 1000;
const MATHJS_POINTS = 20;
const REPEATS = 201;
/** enough runs for V8 to have optimised the sweep's kernels before timing starts */
const WARMUP = 50;
const MATHJS_REPEATS = 5;
const TARGET_LADDER_MS = 2;
const TARGET_RATIO = 1000;
const TARGET_DC_OP_MS = 0.5;

interface BenchCase {
  name: string;
  nets: number;
  points: number;
  median_ms: number;
  /** fastest of the same timed runs (best-of-N) */
  best_ms: number;
  mathjs_median_ms: number;
  ratio: number;
  dense_median_ms: number;
  dense_best_ms: number;
  repeats: number;
  mathjs_points_timed: number;
  dense_fallbacks: number;
}

/** 1,000 log-spaced points from 1 Hz to 100 kHz, both ends included. */
function sweepFrequencies(): number[] {
  return Array.from({ length: SWEEP_POINTS }, (_, i) => 10 ** ((5 * i) / (SWEEP_POINTS - 1)));
}

function sweepCase(name: string, circuit: ElaboratedCircuit): BenchCase {
  const compiled = compileCircuit(circuit);
  const op = new OperatingPointSolver(compiled).solve();
  const model = new SmallSignalModel(compiled, op);
  const frequencies = sweepFrequencies();
  const pressure = 1;
  const sparse = timeMs(() => runAc(model, frequencies, pressure), { warmup: WARMUP, repeats: REPEATS });
  const dense = timeMs(prepareDense(model, frequencies, pressure), { warmup: WARMUP, repeats: REPEATS });
  const few = frequencies.filter((_, i) => i % (SWEEP_POINTS / MATHJS_POINTS) === 0);
  const mathjsFew = medianMs(prepareMathjs(model, few, pressure), { warmup: 1, repeats: MATHJS_REPEATS });
  const mathjs = (mathjsFew / few.length) * SWEEP_POINTS;
  return {
    name,
    nets: circuit.nets.length - 1,
    points: SWEEP_POINTS,
    median_ms: sparse.median,
    best_ms: sparse.best,
    mathjs_median_ms: mathjs,
    ratio: mathjs / sparse.median,
    dense_median_ms: dense.median,
    dense_best_ms: dense.best,
    repeats: sparse.repeats,
    mathjs_points_timed: few.length,
    dense_fallbacks: model.denseFallbacks,
  };
}

function operatingPointCase(name: string, circuit: ElaboratedCircuit): BenchCase {
  const compiled = compileCircuit(circuit);
  const solver = new OperatingPointSolver(compiled);
  const reference = solver.solve();
  const cold = timeMs(() => solver.solve(), { warmup: 200, repeats: 501 });
  // mathjs baseline: the same number of Newton linear solves on the final Jacobian.
  const n = compiled.unknowns.length;
  const values = new Float64Array(compiled.dc.nnz + 1);
  const rhs = new Float64Array(n + 1);
  const positions = compiled.dc.positionOfHandle;
  for (const d of compiled.devices) {
    d.startNewton(reference.x);
    d.stampDc({
      x: reference.x,
      thermalVoltage: reference.thermalVoltage,
      sourceScale: 1,
      add: (h, v) => {
        values[positions[h]] += v;
      },
      addRhs: (row, v) => {
        if (row >= 0) rhs[row] += v;
      },
      markLimited: () => {},
    });
  }
  const rows: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const { rowStart, columnOf, originalRowOf, originalColumnOf } = compiled.dc;
  for (let p = 0; p < n; p++) {
    for (let k = rowStart[p]; k < rowStart[p + 1]; k++)
      rows[originalRowOf[p]][originalColumnOf[columnOf[k]]] += values[k];
  }
  const solves = Math.max(1, reference.iterations);
  const mathjs = medianMs(
    () => {
      for (let s = 0; s < solves; s++) lusolveReal(rows, rhs, n);
    },
    { warmup: 3, repeats: 21 },
  );
  return {
    name,
    nets: circuit.nets.length - 1,
    points: 1,
    median_ms: cold.median,
    best_ms: cold.best,
    mathjs_median_ms: mathjs,
    ratio: mathjs / cold.median,
    dense_median_ms: Number.NaN,
    dense_best_ms: Number.NaN,
    repeats: cold.repeats,
    mathjs_points_timed: solves,
    dense_fallbacks: 0,
  };
}

function lusolveReal(rows: number[][], rhs: Float64Array, n: number): void {
  lusolve(
    rows,
    Array.from(rhs.subarray(0, n), (v) => [v]),
  );
}

function demoCircuit(): ElaboratedCircuit {
  const url = new URL("../examples/demo-microphone.json", import.meta.url);
  return elaborate(JSON.parse(readFileSync(url, "utf8")));
}

/** Every row of the benchmark by name, each computed from scratch in the process that runs it. */
const CASES: Record<string, () => BenchCase | ExtraRow | ExtraRow[]> = {
  ladder: () => sweepCase("rc-ladder-40 ac sweep", rcLadder(40)),
  "demo-sweep": () => sweepCase("demo-microphone ac sweep", demoCircuit()),
  "demo-op": () => operatingPointCase("demo-microphone dc operating point", demoCircuit()),
  noise: () => noiseCase("demo-microphone noise 20 Hz–20 kHz", demoCircuit()),
  spread: () => spreadCase(`demo-microphone spread ${SPREAD_RUNS} runs`, demoCircuit()),
  // no mathjs baseline: mathjs has no time-domain solver
  "large-signal": () => largeSignalCases(demoCircuit()).map((c) => ({ ...c, mathjs_median_ms: null, ratio: null })),
};

/** the noise, spread and large-signal rows: no dense or mathjs columns */
type ExtraRow = ExtraBenchCase | LargeSignalBenchCase;

/** Run one case in a fresh child process (same loader and flags) and take its result. */
function runIsolated(name: string): Promise<BenchCase | ExtraRow | ExtraRow[]> {
  return new Promise((resolve, reject) => {
    const child = fork(fileURLToPath(import.meta.url), ["--case", name], {
      stdio: ["ignore", "inherit", "inherit", "ipc"],
    });
    let result: BenchCase | ExtraRow | ExtraRow[] | undefined;
    child.on("message", (m) => {
      result = m as BenchCase | ExtraRow | ExtraRow[];
    });
    child.on("error", reject);
    child.on("exit", (code) =>
      result !== undefined ? resolve(result) : reject(new Error(`bench case ${name} exited with ${code}`)),
    );
  });
}

async function main(): Promise<void> {
  const caseAt = process.argv.indexOf("--case");
  if (caseAt >= 0) {
    const run = CASES[process.argv[caseAt + 1]];
    if (!run)
      throw new Error(`Unknown bench case "${process.argv[caseAt + 1]}"; one of: ${Object.keys(CASES).join(", ")}`);
    // NaN is not JSON: the IPC channel serialises as JSON, so non-finite numbers travel as null and print as —.
    const json = JSON.stringify(run(), (_k, v) => (typeof v === "number" && !Number.isFinite(v) ? null : v));
    if (process.send) process.send(JSON.parse(json));
    else process.stdout.write(`${json}\n`);
    return;
  }
  const results: Record<string, BenchCase | ExtraRow | ExtraRow[]> = {};
  for (const name of Object.keys(CASES)) results[name] = await runIsolated(name);
  const cases = [results.ladder, results["demo-sweep"], results["demo-op"]] as BenchCase[];
  const extra = [results.noise, results.spread, ...(results["large-signal"] as ExtraRow[])] as ExtraRow[];
  if (process.argv.includes("--json")) {
    process.stdout.write(
      `${JSON.stringify({ cases: [...cases, ...extra] }, (_k, v) => (typeof v === "number" && !Number.isFinite(v) ? null : v))}\n`,
    );
    return;
  }
  const pad = (s: string, w: number) => s.padEnd(w);
  const fmt = (v: number | null) => (v !== null && Number.isFinite(v) ? v.toPrecision(4) : "—");
  console.log(
    `${pad("case", 38)}${pad("nets", 6)}${pad("points", 8)}${pad("sparse ms", 12)}${pad("dense ms", 12)}${pad("mathjs ms", 12)}${pad("ratio", 10)}best of N: sparse / dense ms`,
  );
  for (const c of cases) {
    console.log(
      `${pad(c.name, 38)}${pad(String(c.nets), 6)}${pad(String(c.points), 8)}${pad(fmt(c.median_ms), 12)}${pad(fmt(c.dense_median_ms), 12)}${pad(fmt(c.mathjs_median_ms), 12)}${pad(`${fmt(c.ratio)}×`, 10)}${fmt(c.best_ms)} / ${fmt(c.dense_best_ms)} (N = ${c.repeats})`,
    );
  }
  for (const c of extra) {
    console.log(
      `${pad(c.name, 38)}${pad(String(c.nets), 6)}${pad(String(c.points), 8)}${pad(fmt(c.median_ms), 12)}${pad("—", 12)}${pad("—", 12)}— (${c.note})`,
    );
  }
  console.log(
    `\nmathjs lusolve timed on ${MATHJS_POINTS} of the ${SWEEP_POINTS} points and scaled per point to ${SWEEP_POINTS}; the DC case's mathjs figure is that many linear solves of the final Jacobian (one per Newton iteration).`,
  );
  const ladder = cases[0];
  const op = cases[2];
  console.log(
    `ms columns are medians of repeated runs after warm-up. targets: 40-net sweep ${fmt(ladder.median_ms)} ms median, best ${fmt(ladder.best_ms)} (< ${TARGET_LADDER_MS}: ${ladder.median_ms < TARGET_LADDER_MS ? "met" : "NOT met"}), ` +
      `${fmt(ladder.ratio)}× mathjs (≥ ${TARGET_RATIO}: ${ladder.ratio >= TARGET_RATIO ? "met" : "NOT met"}), ` +
      `demo DC op ${fmt(op.median_ms)} ms (< ${TARGET_DC_OP_MS}: ${op.median_ms < TARGET_DC_OP_MS ? "met" : "NOT met"}), ` +
      `demo noise ${fmt(extra[0].median_ms)} ms (< ${TARGET_NOISE_MS}: ${extra[0].median_ms < TARGET_NOISE_MS ? "met" : "NOT met"}), ` +
      `demo spread ${fmt(extra[1].median_ms)} ms (< ${TARGET_SPREAD_MS}: ${extra[1].median_ms < TARGET_SPREAD_MS ? "met" : "NOT met"}), ` +
      `demo max_spl_db ${fmt(extra[2].median_ms)} ms (< ${TARGET_MAX_SPL_MS}: ${extra[2].median_ms < TARGET_MAX_SPL_MS ? "met" : "NOT met"}), ` +
      `demo 100 ms transient ${fmt(extra[3].median_ms)} ms (< ${TARGET_TRANSIENT_MS}: ${extra[3].median_ms < TARGET_TRANSIENT_MS ? "met" : "NOT met"})`,
  );
}

main().catch((e) => {
  console.error(e instanceof Error ? e.message : e);
  process.exit(1);
});
