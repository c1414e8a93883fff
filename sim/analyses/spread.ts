/**
 * Monte Carlo spread over the parts' `tolerance` fields (contract: `spread: { runs, seed }`).
 *
 * Each run draws every toleranced value independently: value = nominal·(1 + δ), δ uniform on [−t, +t] (the
 * default) or normal with σ = t/3 (`tolerance_distribution: "normal"`, the tolerance taken as 3σ; a draw that
 * would flip the value's sign, possible only for t near 100 %, is drawn again). The draws come from one seeded
 * generator (random.ts) in a fixed order — parts in circuit order, values in the order the file lists them —
 * so a seed reproduces the statistics exactly. Each run writes its values into the compiled circuit's parts,
 * solves a full operating point warm-started from the nominal solution on the same compiled structure and
 * repeats the requested analyses; the nominal values are restored afterwards. A value the structure depends on
 * (a cable's segment count) is not varied and is named in a warning. A run whose solve fails (no convergence,
 * singular) is counted in `failed_runs` and left out.
 *
 * Output: statistics (statistics.ts: mean, sd, min, max, p5, p95 — type-7 percentiles) for every numeric
 * figure, and when ac runs an envelope of |H| in dB per frequency (min, max, p5, p95).
 */
import { KIND_SPECS } from "../circuit/kinds";
import type { ElaboratedPart } from "../circuit/types";
import { isSimError } from "../errors";
import type { FigureStatistics, SimulationResult, SimWarning, SpreadResult } from "../results";
import type { CompiledCircuit } from "./compile";
import { SeededRandom } from "./random";
import { summarise } from "./statistics";

/** One draw site: a value of a part with its nominal value and tolerance. */
interface VariedValue {
  part: ElaboratedPart;
  name: string;
  nominal: number;
  tolerance: number;
  normal: boolean;
}

/** The values a spread varies, and warnings for those it cannot. */
export function variedValues(compiled: CompiledCircuit): { varied: VariedValue[]; warnings: SimWarning[] } {
  const varied: VariedValue[] = [];
  const warnings: SimWarning[] = [];
  for (const part of compiled.circuit.parts) {
    for (const [name, tolerance] of Object.entries(part.tolerance)) {
      const nominal = part.values[name];
      if (typeof nominal !== "number" || !(tolerance > 0)) continue;
      const spec = KIND_SPECS[part.kind].values[name];
      if (spec?.type === "number" && spec.range.integer) {
        warnings.push({
          part: part.id,
          message: `${part.id}.${name} is a count that sets the circuit's structure; the spread keeps it at ${nominal} — remove its tolerance`,
        });
        continue;
      }
      varied.push({ part, name, nominal, tolerance, normal: part.toleranceDistribution === "normal" });
    }
  }
  return { varied, warnings };
}

/** δ for one value: uniform on [−t, t], or normal with σ = t/3 redrawn until 1 + δ > 0. */
function drawDeviation(random: SeededRandom, v: VariedValue): number {
  if (!v.normal) return v.tolerance * random.symmetric();
  for (;;) {
    const delta = (v.tolerance / 3) * random.normal();
    if (1 + delta > 0) return delta;
  }
}

/**
 * Run the spread. `solveOnce(warmStart)` repeats the requested analyses with the values the parts hold now,
 * starting every operating point from `warmStart` (the nominal solution).
 */
export function runSpread(
  compiled: CompiledCircuit,
  request: { runs: number; seed: number },
  solveOnce: (warmStart: Float64Array) => SimulationResult,
  nominalSolution: Float64Array,
): SpreadResult {
  const { varied, warnings } = variedValues(compiled);
  const random = new SeededRandom(request.seed);
  const samples = new Map<string, number[]>();
  let frequency: number[] | undefined;
  let columns: number[][] | undefined;
  let failed = 0;
  try {
    for (let run = 0; run < request.runs; run++) {
      for (const v of varied) v.part.values[v.name] = v.nominal * (1 + drawDeviation(random, v));
      let result: SimulationResult;
      try {
        result = solveOnce(nominalSolution);
      } catch (e) {
        if (!isSimError(e)) throw e;
        failed++;
        continue;
      }
      for (const [figure, value] of Object.entries(result.figures)) {
        if (typeof value !== "number" && value !== null) continue;
        let list = samples.get(figure);
        if (!list) {
          list = [];
          samples.set(figure, list);
        }
        if (typeof value === "number" && Number.isFinite(value)) list.push(value);
      }
      if (result.ac) {
        if (!columns) {
          frequency = result.ac.frequency;
          columns = frequency.map(() => []);
        }
        const db = result.ac.magnitude_db;
        for (let i = 0; i < columns.length; i++) columns[i].push(db[i]);
      }
    }
  } finally {
    for (const v of varied) v.part.values[v.name] = v.nominal;
  }
  const figures: Record<string, FigureStatistics> = {};
  for (const [figure, list] of samples) figures[figure] = summarise(list);
  const out: SpreadResult = { runs: request.runs, figures };
  if (failed > 0) {
    out.failed_runs = failed;
    warnings.push({
      message: `${failed} of ${request.runs} Monte Carlo runs did not solve (no DC convergence or a singular circuit) and are left out of the statistics`,
    });
  }
  if (columns && frequency) {
    const stats = columns.map((c) => summarise(c));
    const pick = (key: keyof FigureStatistics) => stats.map((s) => s[key] ?? Number.NaN);
    out.envelope = { frequency, min_db: pick("min"), max_db: pick("max"), p5_db: pick("p5"), p95_db: pick("p95") };
  }
  if (warnings.length > 0) out.warnings = warnings;
  return out;
}
