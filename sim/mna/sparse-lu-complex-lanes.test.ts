import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { compileCircuit } from "../analyses/compile";
import { OperatingPointSolver } from "../analyses/op";
import { SmallSignalModel } from "../analyses/small-signal";
import { rcLadder } from "../bench/rc-ladder";
import { elaborate } from "../circuit/elaborate";
import type { ElaboratedCircuit } from "../circuit/types";
import { SparseLuComplexLanes, SWEEP_LANES } from "./sparse-lu-complex-lanes";

/** Full solve and output-only planned solve of the same factors; every unknown the plan covers must match exactly. */
function compare(c: ElaboratedCircuit, frequencies: number[]): { planned: number; total: number } {
  const compiled = compileCircuit(c);
  const model = new SmallSignalModel(compiled, new OperatingPointSolver(compiled).solve());
  const n = compiled.unknowns.length;
  const lu = new SparseLuComplexLanes(compiled.ac);
  const rhsRe = new Float64Array((n + 1) * SWEEP_LANES);
  const rhsIm = new Float64Array((n + 1) * SWEEP_LANES);
  // An arbitrary dense right-hand side, so no step is skipped for want of data.
  for (let k = 0; k < n * SWEEP_LANES; k++) {
    rhsRe[k] = Math.sin(k + 1);
    rhsIm[k] = Math.cos(3 * k);
  }
  lu.factorAt(
    model.conductance,
    model.reactance,
    frequencies.map((f) => 2 * Math.PI * f),
  );
  const output = compiled.netIndex.get(c.output.plus)!;
  lu.solve(rhsRe, rhsIm);
  const full = Array.from({ length: SWEEP_LANES }, (_, b) => [lu.solutionRe(output, b), lu.solutionIm(output, b)]);
  const plan = lu.outputPlan([output]);
  // Spoil the work vector so the planned solve cannot pass by reading the full solve's leftovers.
  lu.solve(new Float64Array(rhsRe.length).fill(7), new Float64Array(rhsIm.length).fill(-3));
  lu.solvePlanned(rhsRe, rhsIm, plan);
  for (let b = 0; b < SWEEP_LANES; b++) {
    expect(lu.solutionRe(output, b)).toBe(full[b][0]);
    expect(lu.solutionIm(output, b)).toBe(full[b][1]);
  }
  return { planned: plan.forwardSteps.length + plan.backSteps.length, total: 2 * n };
}

describe("lane LU solve restricted to the output unknowns", () => {
  it("gives the demo microphone's output exactly as the full solve, visiting fewer steps", () => {
    const url = new URL("../examples/demo-microphone.json", import.meta.url);
    const demo = elaborate(JSON.parse(readFileSync(url, "utf8")));
    const { planned, total } = compare(demo, [1, 330, 1e4, 9.9e4]);
    expect(planned).toBeLessThan(total);
  });

  it("gives a 40-section RC ladder's output exactly as the full solve", () => {
    compare(rcLadder(40), [2, 50, 3e3, 1e5]);
  });
});
