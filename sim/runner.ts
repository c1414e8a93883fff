/**
 * The headless run, apart from the solver it calls: elaborate → topology checks → simulate, then the sweep (the
 * other analyses repeated for each value of one parameter, by elaborating again with that parameter overridden).
 * `run.ts` binds it to the solver; tests can bind it to any function of the same type.
 */
import { elaborate } from "./circuit/elaborate";
import { checkTopology } from "./circuit/topology";
import type { ElaboratedCircuit } from "./circuit/types";
import { BASE_VARIANT, checkTargets, type FiguresByVariant, variantsNeeded } from "./analyses/targets";
import type { OutputDocument, SimulationResult, SweepPoint, TargetCheck } from "./results";

export type Simulate = (circuit: ElaboratedCircuit) => SimulationResult;

export interface RunOptions {
  variant?: string;
}

/** A copy of `value` with every non-finite number (NaN, ±Infinity) replaced by null, as the contract requires. */
export function withFiniteNumbers<T>(value: T): T {
  if (typeof value === "number") return (Number.isFinite(value) ? value : null) as T;
  if (Array.isArray(value)) return value.map((item) => withFiniteNumbers(item)) as T;
  if (ArrayBuffer.isView(value)) return withFiniteNumbers(Array.from(value as unknown as ArrayLike<number>)) as T;
  if (value !== null && typeof value === "object") {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, withFiniteNumbers(v)])) as T;
  }
  return value;
}

function solve(simulate: Simulate, circuit: ElaboratedCircuit): SimulationResult {
  checkTopology(circuit);
  return simulate(circuit);
}

export function runWith(simulate: Simulate, file: unknown, options: RunOptions = {}): OutputDocument {
  const circuit = elaborate(file, { variant: options.variant });
  const { sweep, ...others } = circuit.analyses;
  const result = solve(simulate, { ...circuit, analyses: others });
  // key order as in the contract's document: op, ac, noise, figures, sweep
  const document: OutputDocument = {
    ...(result.op && { op: result.op }),
    ...(result.ac && { ac: result.ac }),
    ...(result.noise && { noise: result.noise }),
    ...(result.transient && { transient: result.transient }),
    ...(result.distortion && { distortion: result.distortion }),
    ...(result.ripple && { ripple: result.ripple }),
    figures: result.figures,
  };
  if (sweep) {
    document.sweep = sweep.values.map((value): SweepPoint => {
      const swept = elaborate(file, { variant: options.variant, parameters: { [sweep.parameter]: value } });
      // a sweep point repeats the primary analyses only, not the Monte Carlo spread
      const { sweep: _repeat, spread: _spread, ...analyses } = swept.analyses;
      return { value, figures: solve(simulate, { ...swept, analyses }).figures };
    });
  }
  if (result.spread) document.spread = result.spread;
  if (circuit.targets.length > 0) document.checks = targetChecks(simulate, file, circuit, result, options);
  return withFiniteNumbers(document);
}

/**
 * The contract's `checks`: a target without a variant is held against the run itself (the base design, or the
 * `--variant` chosen); a target for another variant runs that variant's primary analyses (no sweep, no spread).
 */
function targetChecks(
  simulate: Simulate,
  file: unknown,
  circuit: ElaboratedCircuit,
  result: SimulationResult,
  options: RunOptions,
): TargetCheck[] {
  const byVariant: FiguresByVariant = { [BASE_VARIANT]: result.figures };
  if (options.variant !== undefined) byVariant[options.variant] = result.figures;
  for (const name of variantsNeeded(circuit.targets)) {
    if (byVariant[name]) continue;
    const other = elaborate(file, { variant: name });
    const { sweep: _sweep, spread: _spread, ...analyses } = other.analyses;
    byVariant[name] = solve(simulate, { ...other, analyses }).figures;
  }
  return checkTargets(circuit, byVariant);
}
