import { describe, expect, it } from "vitest";
import { figureSensitivities } from "./figure-sensitivity";

const LN10 = Math.log(10);
/** The engine finds corners to 0.1 % (contract); over a ±5 % nudge that bounds the elasticity's error by 2·0.001/0.1. */
const CORNER_STEP = 0.05;
const CORNER_ELASTICITY_TOLERANCE = 0.02;

const divider = (r1: number, r2: number) => ({
  format: "backplate/circuit",
  version: 1,
  parts: [
    { id: "VIN", kind: "vsource", pins: { p: "in", n: "0" }, values: { ac: 1 } },
    { id: "R1", kind: "resistor", pins: { a: "in", b: "out" }, values: { resistance: r1 } },
    { id: "R2", kind: "resistor", pins: { a: "out", b: "0" }, values: { resistance: r2 } },
  ],
  output: { plus: "out", minus: "0" },
});

const highPass = {
  format: "backplate/circuit",
  version: 1,
  parameters: { RH: "10k" },
  parts: [
    { id: "VIN", kind: "vsource", pins: { p: "in", n: "0" }, values: { ac: 1 } },
    { id: "C1", kind: "capacitor", pins: { a: "in", b: "out" }, values: { capacitance: "1u" } },
    { id: "R1", kind: "resistor", pins: { a: "out", b: "0" }, values: { resistance: "RH" } },
  ],
  output: { plus: "out", minus: "0" },
};

function entry(result: ReturnType<typeof figureSensitivities>, figure: string, part: string) {
  const f = result.find((x) => x.figure === figure);
  const e = f?.ranked.find((x) => x.part === part);
  if (!f || !e) throw new Error(`no ${figure} / ${part}`);
  return { f, e };
}

describe("figure sensitivity by re-solving", () => {
  it("gain of a resistive divider: dG/d ln R1 = −(20/ln 10)·R1/(R1+R2) dB (closed form of 20·log10(R2/(R1+R2)))", () => {
    const r1 = 10e3;
    const r2 = 30e3;
    const result = figureSensitivities(divider(r1, r2));
    const { e: s1 } = entry(result, "gain_1khz_db", "R1");
    const { e: s2 } = entry(result, "gain_1khz_db", "R2");
    expect(s1.sensitivity).toBeCloseTo((-20 / LN10) * (r1 / (r1 + r2)), 3);
    expect(s2.sensitivity).toBeCloseTo((20 / LN10) * (r1 / (r1 + r2)), 3);
    expect(s1.elasticity).toBeNull();
  });

  it("output impedance R1 ∥ R2: elasticity to R1 is R2/(R1+R2) (closed form), ranked R1, R2, then the drive (no influence)", () => {
    const result = figureSensitivities(divider(10e3, 30e3));
    const { f, e } = entry(result, "output_impedance_1khz_ohm", "R1");
    expect(f.baseline).toBeCloseTo(7500, 6);
    expect(e.elasticity).toBeCloseTo(0.75, 3);
    expect(f.ranked.map((x) => x.part)).toEqual(["R1", "R2", "VIN"]);
    expect(f.ranked[2].elasticity).toBeCloseTo(0, 9);
  });

  it("RC high-pass corner 1/(2πRC): elasticity −1 to both R and C (closed form), through a parameter", () => {
    const result = figureSensitivities(highPass, { relativeStep: CORNER_STEP });
    const { f, e: r } = entry(result, "low_corner_hz", "R1");
    const { e: c } = entry(result, "low_corner_hz", "C1");
    expect(f.baseline).toBeCloseTo(1 / (2 * Math.PI * 10e3 * 1e-6), 2);
    expect(Math.abs((r.elasticity ?? 0) + 1)).toBeLessThan(CORNER_ELASTICITY_TOLERANCE);
    expect(Math.abs((c.elasticity ?? 0) + 1)).toBeLessThan(CORNER_ELASTICITY_TOLERANCE);
    expect(r.value).toBe(10e3);
  });

  it("reports progress for every nudged value and rejects a step outside (0, 0.5)", () => {
    const seen: number[] = [];
    figureSensitivities(divider(1e3, 1e3), { onProgress: (done, total) => seen.push(done / total) });
    // VIN's ac, R1 and R2: three written numeric values
    expect(seen).toEqual([1 / 3, 2 / 3, 1]);
    expect(() => figureSensitivities(divider(1e3, 1e3), { relativeStep: 0.7 })).toThrow(/between 0 and 0.5/);
  });
});
