import Complex from "complex.js";
import { describe, expect, it } from "vitest";
import { cableCapacitance, cableLoading, cableTransferMagnitude } from "./cable-loading";

/** Agreement asked between the module's closed forms and the independent complex-impedance evaluation, dB. */
const DB_TOLERANCE = 1e-9;

/**
 * Independent reference: the voltage divider Z_load / (Z_src + Z_load) built from impedances with complex.js
 * (R ∥ 1/(jωC) = R / (1 + jωRC)), a different route from the module's admittance form.
 */
function referenceTransfer(rs: number, cs: number, ctotal: number, rin: number, f: number): Complex {
  const w = 2 * Math.PI * f;
  const parallelRC = (r: number, c: number) =>
    Number.isFinite(r) ? new Complex(r).div(new Complex(1, w * r * c)) : new Complex(1).div(new Complex(0, w * c));
  const zs = parallelRC(rs, cs);
  const zl = parallelRC(rin, ctotal);
  return zl.div(zs.add(zl));
}
const db = (z: Complex) => 20 * Math.log10(z.abs());

describe("cable capacitance (common practice: ≈ 100 pF/m conductor to conductor)", () => {
  it("a 10 m run is 1 nF; a 30 m run at 150 pF/m is 4.5 nF", () => {
    expect(cableCapacitance(10)).toBeCloseTo(1e-9, 20);
    expect(cableCapacitance(30, 150e-12)).toBeCloseTo(4.5e-9, 20);
  });
});

describe("a source driving a cable into an input R ∥ C", () => {
  // Invented bench case: a 200 Ω output into 100 m of cable (10 nF) and a 1.2 kΩ ∥ 100 pF input.
  const bench = {
    sourceResistanceOhm: 200,
    cableCapacitanceF: cableCapacitance(100),
    inputResistanceOhm: 1200,
    inputCapacitanceF: 100e-12,
  };

  it("divider loss is 20·log10(Rin/(Rsrc + Rin)) = 20·log10(1200/1400) = −1.339 dB (hand calculation)", () => {
    expect(cableLoading(bench).dividerLossDb).toBeCloseTo(-1.33894, 5);
  });

  it("the corner is 1/(2π·(Rsrc ∥ Rin)·Ctotal) when the source has no capacitance", () => {
    // (200 ∥ 1200) = 171.43 Ω; Ctotal = 10.1 nF → 1/(2π · 171.43 · 10.1e-9) = 91.92 kHz.
    const corner = cableLoading(bench).cornerHz;
    expect(corner).not.toBeNull();
    expect(corner!).toBeCloseTo(1 / (2 * Math.PI * ((200 * 1200) / 1400) * 10.1e-9), 6);
  });

  it("the loss at 1 kHz and at the corner agree with complex.js", () => {
    const result = cableLoading(bench);
    const ref1k = referenceTransfer(200, 0, 10.1e-9, 1200, 1000);
    expect(Math.abs(result.lossAt1kHzDb - db(ref1k))).toBeLessThan(DB_TOLERANCE);
    const refCorner = referenceTransfer(200, 0, 10.1e-9, 1200, result.cornerHz!);
    expect(db(refCorner) - result.dividerLossDb).toBeCloseTo(-10 * Math.log10(2), 9);
  });

  it("with a source capacitance the corner still sits 3 dB down, checked with complex.js", () => {
    const withCs = { ...bench, sourceCapacitanceF: 2e-9 };
    const result = cableLoading(withCs);
    expect(result.cornerHz).not.toBeNull();
    const ref = referenceTransfer(200, 2e-9, 10.1e-9, 1200, result.cornerHz!);
    expect(db(ref) - result.dividerLossDb).toBeCloseTo(-10 * Math.log10(2), 9);
    expect(20 * Math.log10(cableTransferMagnitude(withCs, 5000))).toBeCloseTo(
      db(referenceTransfer(200, 2e-9, 10.1e-9, 1200, 5000)),
      9,
    );
  });

  it("an unloaded input (Rin = ∞) has no divider loss and a corner at 1/(2π·Rsrc·Ctotal)", () => {
    const result = cableLoading({
      sourceResistanceOhm: 1000,
      cableCapacitanceF: 1e-9,
      inputResistanceOhm: Number.POSITIVE_INFINITY,
    });
    expect(result.dividerLossDb).toBe(0);
    expect(result.cornerHz!).toBeCloseTo(1 / (2 * Math.PI * 1000 * 1e-9), 6);
    expect(result.lossAt1kHzDb).toBeCloseTo(db(referenceTransfer(1000, 0, 1e-9, Number.POSITIVE_INFINITY, 1000)), 9);
  });

  it("reports no corner when the source capacitance holds the response within 3 dB", () => {
    // H(∞) = Cs/(Cs + Ct) = 10 nF / 11 nF → −0.83 dB at high frequency: never 3 dB down.
    const result = cableLoading({
      sourceResistanceOhm: 200,
      sourceCapacitanceF: 10e-9,
      cableCapacitanceF: 1e-9,
      inputResistanceOhm: 1e6,
    });
    expect(result.cornerHz).toBeNull();
  });

  it("rejects bad inputs with a RangeError", () => {
    expect(() => cableCapacitance(-1)).toThrow(/Cable length must be/);
    expect(() => cableLoading({ ...bench, sourceResistanceOhm: 0 })).toThrow(/Source resistance must be/);
    expect(() => cableLoading({ ...bench, inputResistanceOhm: Number.NaN })).toThrow(/Input resistance/);
    expect(() => cableLoading({ ...bench, cableCapacitanceF: -1e-9 })).toThrow(RangeError);
  });
});
