import { describe, expect, it } from "vitest";
import type { ElaboratedCircuit } from "../circuit/types";
import { compileCircuit } from "./compile";
import { OperatingPointSolver } from "./op";
import { AnalysisCancelled, TransientRun } from "./transient";
import { Drive } from "./drive";
import { circuit, part } from "./test-circuits";

function prepare(c: ElaboratedCircuit) {
  const compiled = compileCircuit(c);
  const op = new OperatingPointSolver(compiled).solve();
  return { compiled, op, index: (net: string) => compiled.netIndex.get(net)! };
}

describe("transient integration", () => {
  it("power-on RC charging follows 1 − e^(−t/RC) at several times", () => {
    // Closed form of a first-order RC step response (any circuits text): v(t) = V·(1 − e^(−t/RC)).
    const V = 10;
    const RC = 1e3 * 1e-6;
    const { compiled, op, index } = prepare(
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { dc: V }),
          part("R1", "resistor", { a: "in", b: "out" }, { resistance: 1e3 }),
          part("C1", "capacitor", { a: "out", b: "0" }, { capacitance: 1e-6 }),
        ],
        { plus: "out" },
      ),
    );
    const run = new TransientRun(compiled, op, { start: "power-on", maxStep: RC / 20, drive: null });
    const checks = [0.5 * RC, RC, 2 * RC, 3 * RC];
    const out = index("out");
    for (const t of checks) {
      run.advance(t);
      // the integrator's relative tolerance is 1e-3 of the node voltage, so allow 3e-3 of V
      expect(Math.abs(run.x[out] - V * (1 - Math.exp(-t / RC)))).toBeLessThan(3e-3 * V);
    }
    expect(run.time).toBe(3 * RC);
  });

  it("LC ringing keeps its amplitude over 60 periods with the trapezoidal rule", () => {
    // A step V into series L–C: v_C(t) = V·(1 − cos(t/√(LC))), amplitude V forever (lossless LC, energy
    // conservation); the trapezoidal rule is energy-conserving on a linear oscillator (textbook property).
    const L = 1e-3;
    const C = 1e-6;
    const period = 2 * Math.PI * Math.sqrt(L * C);
    const { compiled, op, index } = prepare(
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { dc: 1 }),
          part("L1", "inductor", { a: "in", b: "x" }, { inductance: L }),
          part("C1", "capacitor", { a: "x", b: "0" }, { capacitance: C }),
          // a DC path for the capacitor node that does not damp: 1 TΩ across C (Q ≈ 3·10⁷)
          part("RLEAK", "resistor", { a: "x", b: "0" }, { resistance: 1e12 }),
        ],
        { plus: "x" },
      ),
    );
    const run = new TransientRun(compiled, op, { start: "power-on", maxStep: period / 40, drive: null });
    const x = index("x");
    const peaks: number[] = [];
    let high = -Infinity;
    let cycle = 0;
    run.advance(60 * period, (t, sol) => {
      const k = Math.floor(t / period);
      if (k > cycle) {
        peaks.push(high);
        high = -Infinity;
        cycle = k;
      }
      high = Math.max(high, sol[x]);
    });
    expect(peaks.length).toBeGreaterThanOrEqual(55);
    // peak 2·V every period; sampled peaks sit within (1 − cos(π/40)) of it at 40 steps per period
    const AMPLITUDE_TOLERANCE = 0.01;
    for (const p of peaks.slice(1)) expect(Math.abs(p - 2)).toBeLessThan(AMPLITUDE_TOLERANCE * 2);
    expect(Math.abs(peaks.at(-1)! - peaks[1])).toBeLessThan(AMPLITUDE_TOLERANCE * 2);
    expect(run.stats.gearSteps).toBe(0);
  });

  it("with no drive the DC operating point is the transient's steady state", () => {
    // Definition of a DC operating point: all time derivatives vanish, so the solution stays put.
    const { compiled, op } = prepare(
      circuit(
        [
          part("VDD", "vsource", { p: "vdd", n: "0" }, { dc: 12 }),
          part("RD", "resistor", { a: "vdd", b: "d" }, { resistance: 2e3 }),
          part("J1", "jfet", { d: "d", g: "0", s: "s" }, { idss: 8e-3, pinch_off: -4, cgs: 5e-12, cgd: 1e-12 }),
          part("RS", "resistor", { a: "s", b: "0" }, { resistance: 1e3 }),
          part("CS", "capacitor", { a: "s", b: "0" }, { capacitance: 10e-6 }),
          part("L1", "inductor", { a: "d", b: "o" }, { inductance: 1e-3 }),
          part("RL", "resistor", { a: "o", b: "0" }, { resistance: 1e4 }),
        ],
        { plus: "o" },
      ),
    );
    const run = new TransientRun(compiled, op, { start: "op", maxStep: 1e-4, drive: null });
    run.advance(0.01);
    // each time point is exact to the Newton step tolerance (1e-9 relative); allow ten of them over the run
    const STEADY_TOLERANCE = 1e-8;
    for (let i = 0; i < op.x.length; i++) {
      expect(Math.abs(run.x[i] - op.x[i])).toBeLessThan(STEADY_TOLERANCE * (1 + Math.abs(op.x[i])));
    }
  });

  it("reports progress and stops when asked", () => {
    const { compiled, op } = prepare(
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { dc: 1, ac: 1 }),
          part("R1", "resistor", { a: "in", b: "out" }, { resistance: 1e3 }),
          part("C1", "capacitor", { a: "out", b: "0" }, { capacitance: 1e-6 }),
        ],
        { plus: "out" },
      ),
    );
    const drive = new Drive({ shape: "sine", frequency: 1000, level: 1 }, compiled.circuit.parts);
    const fractions: number[] = [];
    const run = new TransientRun(compiled, op, { start: "op", maxStep: 1e-5, drive });
    run.advance(1e-3, undefined, { onProgress: (f) => fractions.push(f) });
    expect(fractions.at(-1)).toBe(1);
    expect(fractions.length).toBeGreaterThan(10);
    let polls = 0;
    expect(() => run.advance(2e-3, undefined, { shouldStop: () => ++polls > 5 })).toThrow(AnalysisCancelled);
  });
});
