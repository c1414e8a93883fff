import { describe, expect, it } from "vitest";
import { DEFAULT_TEMPERATURE_K } from "../circuit/types";
import { compileCircuit } from "./compile";
import { OperatingPointSolver } from "./op";
import { simulate } from "./simulate";
import { acGrid, circuit, part } from "./test-circuits";

const close = (actual: number | null | undefined, expected: number, tol: number) => {
  expect(typeof actual).toBe("number");
  expect(Math.abs((actual as number) / expected - 1)).toBeLessThan(tol);
};

describe("transformer", () => {
  it("reflects the load as n²·Z (n = Np/Ns) into the primary", () => {
    // Z_in = n²·Z_load with n = Np/Ns (reference README). ratio = Ns/Np = 2 → n = 0.5: 10 kΩ looks like 2.5 kΩ,
    // in parallel with the magnetising reactance jωL (L = 100 H).
    const L = 100;
    const r = simulate(
      circuit(
        [
          part("T1", "transformer", { p1: "pri", p2: "0", s1: "sec", s2: "0" }, { ratio: 2, primary_inductance: L }),
          part("RL", "resistor", { a: "sec", b: "0" }, { resistance: 10e3 }),
        ],
        { plus: "pri" },
      ),
    );
    const w = 2 * Math.PI * 1000;
    const yRe = 1 / 2500;
    const yIm = -1 / (w * L);
    close(r.figures.output_impedance_1khz_ohm, 1 / Math.hypot(yRe, yIm), 1e-9);
  });

  it("low-frequency corner (Rsource ∥ Rrefl)/(2πL); secondary voltage = ratio × primary in the passband", () => {
    // f = (R_source ∥ R_refl)/(2πL) (reference README). 600 Ω source, 10 kΩ load, ratio 2 → R_refl 2.5 kΩ.
    const L = 1;
    const r = simulate(
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { ac: 1 }),
          part("RS", "resistor", { a: "in", b: "pri" }, { resistance: 600 }),
          part("T1", "transformer", { p1: "pri", p2: "0", s1: "sec", s2: "0" }, { ratio: 2, primary_inductance: L }),
          part("RL", "resistor", { a: "sec", b: "0" }, { resistance: 10e3 }),
        ],
        { plus: "sec" },
        { op: { temperature: DEFAULT_TEMPERATURE_K }, ac: acGrid(10, 1e4, 10) },
      ),
    );
    const rp = 1 / (1 / 600 + 1 / 2500);
    const fc = rp / (2 * Math.PI * L);
    // The response is a first-order high-pass; its corner relative to |H(1 kHz)| (not the passband) is:
    const h = 1 / Math.sqrt(1 + (fc / 1000) ** 2);
    close(r.figures.low_corner_hz, fc / Math.sqrt(2 / (h * h) - 1), 1e-3);
    // Passband: divider 2500/(600 + 2500) on the primary, times the ratio 2.
    const last = r.ac!.magnitude_db.length - 1;
    close(10 ** (r.ac!.magnitude_db[last] / 20), (2 * 2500) / 3100, 1e-3);
    // DC: the windings are paths to ground; the op has nothing at the secondary.
    expect(r.op!.nets.sec).toBeCloseTo(0, 12);
  });
});

describe("capsule", () => {
  const micro = (polarisation: number, extra: Record<string, number> = {}) =>
    circuit(
      [
        part("VP", "vsource", { p: "pol", n: "0" }, { dc: polarisation }),
        part("RB", "resistor", { a: "pol", b: "dia" }, { resistance: 1e9 }),
        part(
          "MIC",
          "capsule",
          { diaphragm: "dia", backplate: "0" },
          { capacitance: 50e-12, strain_per_pa: 2e-4, ...extra },
        ),
      ],
      { plus: "dia" },
    );
  // Open-circuit output e = −V·strain·p (contract), seen through the bias high-pass 1/(2π·1 GΩ·50 pF) ≈ 3.2 Hz.
  const highPassAt1k = 1 / Math.sqrt(1 + (1 / (2 * Math.PI * 1e9 * 50e-12 * 1000)) ** 2);

  it("open-circuit sensitivity is proportional to the polarisation", () => {
    const at60 = simulate(micro(60));
    const at120 = simulate(micro(120));
    close(at60.figures.sensitivity_v_per_pa, 60 * 2e-4 * highPassAt1k, 1e-9);
    close(at120.figures.sensitivity_v_per_pa! / at60.figures.sensitivity_v_per_pa!, 2, 1e-12);
    // IEC 60268-4: sensitivity level re 1 V/Pa is 20·log10(M).
    close(at60.figures.sensitivity_db_re_1v_per_pa, 20 * Math.log10(at60.figures.sensitivity_v_per_pa!), 1e-12);
    // The polarisation V0 comes from the DC operating point: the diaphragm sits at 60 V.
    close(at60.op!.nets.dia, 60, 1e-12);
  });

  it("positive pressure with positive polarisation makes the diaphragm voltage fall (inverting)", () => {
    // Contract: a positive pressure narrows the gap, so with a positive polarisation the diaphragm voltage falls.
    expect(simulate(micro(60)).figures.polarity).toBe("inverting");
    expect(simulate(micro(-60)).figures.polarity).toBe("non-inverting");
  });

  it("electret voltage adds to the polarisation; a resonance scales by H(f)", () => {
    // Contract: e = −(V0 + electret_voltage)·strain·p·H(f); at f = f0, H = 1/(j/q) so |H| = q.
    const electret = simulate(micro(0, { electret_voltage: 100 }));
    close(electret.figures.sensitivity_v_per_pa, 100 * 2e-4 * highPassAt1k, 1e-9);
    const resonant = simulate(micro(60, { resonance: 1000, q: 0.7 }));
    close(resonant.figures.sensitivity_v_per_pa, 0.7 * 60 * 2e-4 * highPassAt1k, 1e-6);
  });

  it("warns when the drive closes the gap by more than 10 %", () => {
    const c = micro(60);
    c.analyses.ac = acGrid(100, 1000, 1, 600);
    const r = simulate(c);
    expect(r.ac!.warnings?.map((w) => w.part)).toEqual(["MIC"]);
  });
});

describe("operating point fallbacks", () => {
  // 60 V across two 1 GΩ resistors: a leftover gmin of even 1e-12 S at the middle node would move it by 0.05 %.
  const divider = circuit(
    [
      part("VP", "vsource", { p: "pol", n: "0" }, { dc: 60 }),
      part("R1", "resistor", { a: "pol", b: "mid" }, { resistance: 1e9 }),
      part("R2", "resistor", { a: "mid", b: "0" }, { resistance: 1e9 }),
    ],
    { plus: "mid" },
  );
  it("gmin stepping leaves no gmin in the reported solution", () => {
    // Ohm's law: exactly 30 V.
    const solver = new OperatingPointSolver(compileCircuit(divider));
    const op = solver.solve({ firstStrategy: "gmin-stepping" });
    expect(op.strategy).toBe("gmin-stepping");
    const mid = compileCircuit(divider).netIndex.get("mid")!;
    close(op.x[mid], 30, 1e-12);
  });
  it("source stepping reaches the full-scale solution", () => {
    const solver = new OperatingPointSolver(compileCircuit(divider));
    const op = solver.solve({ firstStrategy: "source-stepping" });
    expect(op.strategy).toBe("source-stepping");
    close(op.x[compileCircuit(divider).netIndex.get("mid")!], 30, 1e-12);
  });
  it("a warm start from the solution converges at once", () => {
    const solver = new OperatingPointSolver(compileCircuit(divider));
    const cold = solver.solve();
    const warm = solver.solve({ initial: cold.x });
    expect(warm.iterations).toBeLessThan(cold.iterations);
    expect(Array.from(warm.x)).toEqual(Array.from(cold.x));
  });
});
