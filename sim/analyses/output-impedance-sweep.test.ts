import { describe, expect, it } from "vitest";
import { outputImpedanceSweep } from "./output-impedance-sweep";

/** R ∥ C: Z = R / (1 + jωRC), |Z| = R/√(1 + (ωRC)²), arg Z = −atan(ωRC) (closed form, common practice). */
function parallelRc(r: number, c: number, f: number) {
  const x = 2 * Math.PI * f * r * c;
  return { magnitude: r / Math.sqrt(1 + x * x), phaseDeg: (-Math.atan(x) * 180) / Math.PI };
}

const R = 10e3;
const C = 10e-9;

const file = {
  format: "backplate/circuit",
  version: 1,
  parts: [
    // a driven source behind R: with every drive off it is a short, so the output sees R ∥ C
    { id: "VIN", kind: "vsource", pins: { p: "in", n: "0" }, values: { ac: 1 } },
    { id: "R1", kind: "resistor", pins: { a: "in", b: "out" }, values: { resistance: R } },
    { id: "C1", kind: "capacitor", pins: { a: "out", b: "0" }, values: { capacitance: C } },
  ],
  output: { plus: "out", minus: "0" },
};

describe("output impedance sweep", () => {
  it("matches R ∥ C at every frequency (closed form)", () => {
    const frequencies = [10, 100, 1000, 1591.5494, 10000, 100000];
    const sweep = outputImpedanceSweep(file, frequencies);
    expect(sweep.frequency).toEqual(frequencies);
    frequencies.forEach((f, i) => {
      const expected = parallelRc(R, C, f);
      expect(sweep.magnitude_ohm[i] / expected.magnitude).toBeCloseTo(1, 9);
      expect(sweep.phase_deg[i]).toBeCloseTo(expected.phaseDeg, 6);
    });
    // at the corner 1/(2πRC) ≈ 1591.5 Hz the magnitude is R/√2 and the phase −45°
    expect(sweep.phase_deg[3]).toBeCloseTo(-45, 3);
  });

  it("throws the engine's error for a broken circuit (a net with no DC path)", () => {
    const broken = { ...file, parts: file.parts.filter((p) => p.id !== "R1") };
    expect(() => outputImpedanceSweep(broken, [1000])).toThrow(/out/);
  });
});
