/**
 * The lane-parallel AC sweep (ac.ts) against the one-frequency small-signal model it stands in for: every point
 * must be the number `SmallSignalModel.response` gives at that frequency — on the benchmark ladder, on the demo
 * microphone (capsule, JFET, cable), for counts that do not fill the last group of lanes, and for a circuit whose
 * static pivots fail so that points go through the dense fallback. The model itself is checked against mathjs in
 * sim/mna/sparse-solve.test.ts and against closed forms in passive.test.ts.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { rcLadder } from "../bench/rc-ladder";
import { elaborate } from "../circuit/elaborate";
import type { ElaboratedCircuit } from "../circuit/types";
import { runAc } from "./ac";
import { compileCircuit } from "./compile";
import { OperatingPointSolver } from "./op";
import { SmallSignalModel } from "./small-signal";
import { circuit, part } from "./test-circuits";

/** Agreement with the closed form for the deliberately ill-conditioned fallback circuit (condition ≈ 1e12). */
const ILL_CONDITIONED_AGREEMENT = 1e-4;

function modelOf(c: ElaboratedCircuit): SmallSignalModel {
  const compiled = compileCircuit(c);
  return new SmallSignalModel(compiled, new OperatingPointSolver(compiled).solve());
}

function logSweep(count: number, from: number, decades: number): number[] {
  return Array.from({ length: count }, (_, i) => from * 10 ** ((decades * i) / Math.max(1, count - 1)));
}

/** Every point of runAc equals model.response at that frequency (=== ignores only the sign of zero). */
function expectSameAsModel(model: SmallSignalModel, frequencies: number[], pressure: number): void {
  const result = runAc(model, frequencies, pressure);
  expect(result.frequency).toEqual(frequencies);
  frequencies.forEach((f, i) => {
    const v = model.response(f, pressure);
    expect(result.re[i] === v.re && result.im[i] === v.im).toBe(true);
    const magnitude = Math.hypot(v.re, v.im);
    expect(result.magnitude_db[i]).toBeCloseTo(20 * Math.log10(magnitude), 10);
    expect(result.phase_deg[i]).toBeCloseTo((Math.atan2(v.im, v.re) * 180) / Math.PI, 10);
  });
}

describe("AC sweep (lanes) vs the one-frequency small-signal model", () => {
  it("gives the model's numbers on the 40-net RC ladder", () => {
    expectSameAsModel(modelOf(rcLadder(40)), logSweep(200, 1, 5), 1);
  });

  it("gives the model's numbers on the demo microphone, for every partial last group of lanes", () => {
    const demo = elaborate(
      JSON.parse(readFileSync(new URL("../examples/demo-microphone.json", import.meta.url), "utf8")),
    );
    const model = modelOf(demo);
    for (const count of [1, 2, 3, 4, 5, 7, 101]) expectSameAsModel(model, logSweep(count, 20, 3), 0.5);
  });

  it("returns empty arrays for no frequencies", () => {
    const result = runAc(modelOf(rcLadder(3)), [], 1);
    expect(result.frequency).toEqual([]);
    expect(result.re).toEqual([]);
  });

  it("hands frequencies whose static pivots fail to the model (dense fallback) and still matches it", () => {
    // Nets a and b joined by 1 nΩ (1 GS) and each held by ~1 kΩ: eliminating one leaves the other's pivot at
    // about 1e-3 S against a 1e9 S row, below the static pivot tolerance, so the dense LU must take over.
    const c = circuit(
      [
        part("V1", "vsource", { p: "in", n: "0" }, { ac: 1 }),
        part("R1", "resistor", { a: "in", b: "a" }, { resistance: 1e3 }),
        part("RJ", "resistor", { a: "a", b: "b" }, { resistance: 1e-9 }),
        part("R2", "resistor", { a: "b", b: "0" }, { resistance: 1e3 }),
        part("C1", "capacitor", { a: "b", b: "0" }, { capacitance: 1e-6 }),
      ],
      { plus: "b" },
    );
    const model = modelOf(c);
    const frequencies = logSweep(9, 10, 4);
    const result = runAc(model, frequencies, 1);
    expect(model.denseFallbacks).toBeGreaterThan(0);
    frequencies.forEach((f, i) => {
      // Closed form: the divider 1 kΩ into (1 kΩ ∥ 1 µF), the 1 nΩ link negligible.
      const w = 2 * Math.PI * f;
      const zRe = 1e3 / (1 + (w * 1e-3) ** 2);
      const zIm = (-1e3 * w * 1e-3) / (1 + (w * 1e-3) ** 2);
      const dRe = 1e3 + zRe;
      const d2 = dRe * dRe + zIm * zIm;
      const expectedRe = (zRe * dRe + zIm * zIm) / d2;
      const expectedIm = (zIm * dRe - zRe * zIm) / d2;
      // The matrix's condition number is about 1e12 (1e9 S beside 1e-3 S), so ~1e-4 is all any LU can promise.
      expect(Math.hypot(result.re[i] - expectedRe, result.im[i] - expectedIm)).toBeLessThan(ILL_CONDITIONED_AGREEMENT);
    });
    expectSameAsModel(model, frequencies, 1);
  });
});
