import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { elaborate } from "../circuit/elaborate";
import { DEFAULT_TEMPERATURE_K, type ElaboratedPart } from "../circuit/types";
import { compileCircuit } from "./compile";
import { OperatingPointSolver } from "./op";
import { simulate } from "./simulate";
import { circuit, part } from "./test-circuits";
import { TransientRun } from "./transient";

describe("transient stamps of the energy-storing kinds", () => {
  it("a transformer into R ∥ C: the secondary is ratio × primary through the secondary resistance divider", () => {
    // Ideal transformer V_s = n·V_p (textbook), then the divider Z/(Z + Rs) with Z = R ∥ 1/(jωC) (closed form).
    const n = 2;
    const rs = 100;
    const r = 1e4;
    const c = 10e-9;
    const f = 1000;
    const level = 0.5;
    const circ = circuit(
      [
        { ...part("VIN", "vsource", { p: "in", n: "0" }, { dc: 0, ac: 1 }), role: "input" } as ElaboratedPart,
        part(
          "T1",
          "transformer",
          { p1: "in", p2: "0", s1: "out", s2: "0" },
          {
            ratio: n,
            primary_inductance: 1e3,
            // 1 mΩ: a DC path that is not a voltage-source loop; its drop (≈ 0.2 µV) is far below the tolerance
            primary_resistance: 1e-3,
            secondary_resistance: rs,
          },
        ),
        part("DESK", "load", { p: "out", n: "0" }, { resistance: r, capacitance: c }),
      ],
      { plus: "out" },
      { distortion: { frequency: f, levels: [level], temperature: DEFAULT_TEMPERATURE_K } },
    );
    const [point] = simulate(circ).distortion!;
    const w = 2 * Math.PI * f;
    // |Z/(Z + Rs)| = 1/|1 + Rs·(1/R + jωC)|
    const expected = (n * level) / Math.hypot(1 + rs / r, rs * w * c);
    const AMPLITUDE_TOLERANCE = 1e-3; // trapezoidal at 64 points per period, relative
    expect(Math.abs(point.fundamental / expected - 1)).toBeLessThan(AMPLITUDE_TOLERANCE);
    expect(point.thd_percent).toBeLessThan(1e-3);
  });

  it.each(["valve-transformer", "triode-emitter-follower", "electret-jfet", "demo-microphone"])(
    "%s stays at its operating point with no drive (every kind's stored quantities start at their DC values)",
    (name) => {
      // Definition of the DC operating point: every time derivative is zero there.
      const file = JSON.parse(readFileSync(new URL(`../examples/${name}.json`, import.meta.url), "utf8"));
      const compiled = compileCircuit(elaborate(file));
      const op = new OperatingPointSolver(compiled).solve();
      const run = new TransientRun(compiled, op, { start: "op", maxStep: 1e-4, drive: null });
      run.advance(5e-3);
      const STEADY_TOLERANCE = 1e-7; // relative to 1 V + |x|, Newton tolerance accumulated over the run
      for (let i = 0; i < op.x.length; i++) {
        if (compiled.unknowns[i].kind !== "voltage") continue;
        expect(Math.abs(run.x[i] - op.x[i])).toBeLessThan(STEADY_TOLERANCE * (1 + Math.abs(op.x[i])));
      }
    },
  );
});
