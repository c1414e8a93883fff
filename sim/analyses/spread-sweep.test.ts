import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { elaborate } from "../circuit/elaborate";
import type { ElaboratedCircuit } from "../circuit/types";
import { runAc } from "./ac";
import { compileCircuit } from "./compile";
import { OperatingPointSolver } from "./op";
import { solveAnalyses, spreadAround } from "./simulate";
import { runSpread } from "./spread";
import { SmallSignalModel } from "./small-signal";
import { SpreadSweep } from "./spread-sweep";
import { circuit, part } from "./test-circuits";

/** Agreement of the reduced sweep with the ordinary one: both are exact solves, they differ only by rounding. */
const RELATIVE_AGREEMENT = 1e-9;

const frequencies = Array.from({ length: 60 }, (_, i) => 10 ** ((5 * i) / 59));

function demo(): ElaboratedCircuit {
  return elaborate(JSON.parse(readFileSync(new URL("../examples/demo-microphone.json", import.meta.url), "utf8")));
}

function expectSameResponse(a: { re: number[]; im: number[] }, b: { re: number[]; im: number[] }) {
  for (let i = 0; i < a.re.length; i++) {
    const scale = Math.hypot(b.re[i], b.im[i]);
    expect(Math.hypot(a.re[i] - b.re[i], a.im[i] - b.im[i])).toBeLessThanOrEqual(RELATIVE_AGREEMENT * scale);
  }
}

/**
 * A model of `c` after scaling some values, with its ordinary sweep, and `sweep`'s answer while the values are
 * in place (the drives read them, as in a spread run).
 */
function runModel(
  c: ElaboratedCircuit,
  compiled = compileCircuit(c),
  scale: Record<string, [string, number]> = {},
  sweep?: SpreadSweep,
) {
  const saved: [string, string, number][] = [];
  for (const [id, [name, factor]] of Object.entries(scale)) {
    const p = compiled.circuit.parts.find((q) => q.id === id)!;
    saved.push([id, name, p.values[name] as number]);
    p.values[name] = (p.values[name] as number) * factor;
  }
  const model = new SmallSignalModel(compiled, new OperatingPointSolver(compiled).solve());
  const response = runAc(model, frequencies, 1);
  const re = new Array<number>(frequencies.length).fill(0);
  const im = new Array<number>(frequencies.length).fill(0);
  const answered = sweep?.sweep(model, frequencies, 1, re, im) ?? false;
  for (const [id, name, value] of saved) compiled.circuit.parts.find((q) => q.id === id)!.values[name] = value;
  return { model, response, answered, reduced: { re, im } };
}

describe("the spread's reduced sweep (Schur complement over what the tolerances leave alone)", () => {
  it("gives the ordinary sweep's response for runs of the demo microphone, on 7 of its 29 unknowns", () => {
    const c = demo();
    const compiled = compileCircuit(c);
    const sweep = new SpreadSweep(runModel(c, compiled).model);
    // Each run moves the toleranced values (and with them the JFET's operating point) by a few per cent.
    for (const factor of [1.04, 0.97, 1.08]) {
      const run = runModel(
        c,
        compiled,
        {
          RPOL: ["resistance", factor],
          MIC: ["capacitance", 2 - factor],
          C1: ["capacitance", factor],
          J1: ["idss", 2 - factor],
          RSRC: ["resistance", factor],
        },
        sweep,
      );
      expect(run.answered).toBe(true);
      expectSameResponse(run.reduced, run.response);
    }
    expect(sweep.reducedSize).toBe(7);
    expect(compiled.unknowns.length).toBe(29);
  });

  it("widens its split when a later run moves another entry, and stays exact", () => {
    const ladder = circuit(
      [
        part("V1", "vsource", { p: "in", n: "0" }, { dc: 0, ac: 1 }),
        part("R1", "resistor", { a: "in", b: "a" }, { resistance: 1e3 }),
        part("C1", "capacitor", { a: "a", b: "0" }, { capacitance: 1e-7 }),
        part("R2", "resistor", { a: "a", b: "b" }, { resistance: 1e3 }),
        part("C2", "capacitor", { a: "b", b: "0" }, { capacitance: 1e-7 }),
        part("R3", "resistor", { a: "b", b: "c" }, { resistance: 1e3 }),
        part("C3", "capacitor", { a: "c", b: "0" }, { capacitance: 1e-7 }),
        part("R4", "resistor", { a: "c", b: "d" }, { resistance: 1e3 }),
        part("C4", "capacitor", { a: "d", b: "0" }, { capacitance: 1e-7 }),
      ],
      { plus: "d" },
    );
    const compiled = compileCircuit(ladder);
    const sweep = new SpreadSweep(runModel(ladder, compiled).model);
    const first = runModel(ladder, compiled, { C4: ["capacitance", 1.1] }, sweep);
    expect(first.answered).toBe(true);
    expectSameResponse(first.reduced, first.response);
    expect(sweep.reducedSize).toBe(1);
    const second = runModel(ladder, compiled, { C4: ["capacitance", 0.9], R4: ["resistance", 1.2] }, sweep);
    expect(second.answered).toBe(true);
    expectSameResponse(second.reduced, second.response);
    expect(sweep.reducedSize).toBe(2);
  });

  it("declines when the tolerances touch most of the circuit, leaving the run to the ordinary sweep", () => {
    const divider = circuit(
      [
        part("V1", "vsource", { p: "in", n: "0" }, { dc: 0, ac: 1 }),
        part("R1", "resistor", { a: "in", b: "out" }, { resistance: 1e3 }),
        part("R2", "resistor", { a: "out", b: "0" }, { resistance: 1e3 }),
      ],
      { plus: "out" },
    );
    const compiled = compileCircuit(divider);
    const sweep = new SpreadSweep(runModel(divider, compiled).model);
    const run = runModel(divider, compiled, { R1: ["resistance", 1.1], R2: ["resistance", 0.9] }, sweep);
    expect(run.answered).toBe(false);
  });

  it("leaves a seeded spread's statistics and envelope as the per-run ordinary sweep gives them", () => {
    const c = demo();
    const compiled = compileCircuit(c);
    const solver = new OperatingPointSolver(compiled);
    const analyses = { ac: { frequencies: { kind: "list" as const, frequencies }, pressure: 1, temperature: 298.15 } };
    const nominal = solveAnalyses(compiled, solver, analyses, { reportOp: false });
    const spread = { runs: 60, seed: 5 };
    const reduced = spreadAround(compiled, solver, analyses, spread, nominal);
    const ordinary = runSpread(
      compiled,
      spread,
      (warmStart) => solveAnalyses(compiled, solver, analyses, { reportOp: false, warmStart }).result,
      nominal.nominal.x,
    );
    for (const [name, stats] of Object.entries(ordinary.figures)) {
      for (const key of ["mean", "sd", "min", "max", "p5", "p95"] as const) {
        const want = stats[key];
        const got = reduced.figures[name][key];
        if (want === null) expect(got, `${name}.${key}`).toBeNull();
        else expect(Math.abs(got! - want), `${name}.${key}`).toBeLessThanOrEqual(1e-7 * Math.max(1, Math.abs(want)));
      }
    }
    for (const key of ["min_db", "max_db", "p5_db", "p95_db"] as const) {
      const worst = Math.max(...reduced.envelope![key].map((v, i) => Math.abs(v - ordinary.envelope![key][i])));
      expect(worst, key).toBeLessThan(1e-9);
    }
  });
});
