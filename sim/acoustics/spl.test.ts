import { compile } from "mathjs";
import { describe, expect, it } from "vitest";
import { thermalNoiseDensity } from "../calculators/thermal-noise";
import {
  dbReVPerPaToSensitivity,
  equivalentNoiseLevel,
  mvPerPaToSensitivity,
  pascalsToSpl,
  rmsFromAmplitudeDensity,
  rmsFromPowerDensity,
  sensitivityToDbReVPerPa,
  sensitivityToMvPerPa,
  splToPascals,
} from "./spl";
import { logFrequencyGrid } from "./weighted-rms";

/** IEC 60268-4: 1 Pa = 93.98 dB SPL, commonly rounded to 94 dB; the rounding is worth 0.02 dB. */
const ROUNDED_94_DB_TOLERANCE = 0.03;
/** Relative agreement asked of the module's trapezoid rule against an independent fine Simpson integral. */
const INTEGRAL_RELATIVE_TOLERANCE = 1e-4;

describe("SPL and sensitivity conversions (IEC 60268-4)", () => {
  it("1 Pa is 93.98 dB SPL re 20 µPa, and 94 dB SPL is ≈ 1 Pa", () => {
    expect(pascalsToSpl(1)).toBeCloseTo(93.98, 2);
    expect(splToPascals(94)).toBeCloseTo(1.00237, 5);
    expect(pascalsToSpl(splToPascals(120))).toBeCloseTo(120, 10);
  });

  it("10 mV/Pa is −40 dB re 1 V/Pa (reference notes, IEC 60268-4)", () => {
    expect(sensitivityToDbReVPerPa(mvPerPaToSensitivity(10))).toBeCloseTo(-40, 10);
    expect(sensitivityToMvPerPa(dbReVPerPaToSensitivity(-40))).toBeCloseTo(10, 10);
  });

  it("equivalent noise level is 94 dB + 20·log10(Vn/M) to within the 93.98 rounding (IEC 60268-4)", () => {
    const vn = 1e-6;
    const m = 0.01;
    expect(Math.abs(equivalentNoiseLevel(vn, m) - (94 + 20 * Math.log10(vn / m)))).toBeLessThan(
      ROUNDED_94_DB_TOLERANCE,
    );
    expect(equivalentNoiseLevel(vn, m)).toBeCloseTo(13.98, 2);
  });

  it("rejects non-positive pressures and sensitivities with a RangeError", () => {
    expect(() => pascalsToSpl(0)).toThrow(RangeError);
    expect(() => equivalentNoiseLevel(1e-6, -1)).toThrow(/Sensitivity must be/);
    expect(() => splToPascals(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe("RMS of a power density (circuit-file contract, noise paragraph)", () => {
  it("white noise over a band is density·√bandwidth (exact for the trapezoid rule)", () => {
    const f = logFrequencyGrid(20, 20000, 20);
    const density = new Float64Array(f.length).fill(10e-9);
    expect(rmsFromAmplitudeDensity(f, density)).toBeCloseTo(10e-9 * Math.sqrt(19980), 15);
  });

  it("is the trapezoid rule, linear in f: a density that rises linearly is integrated exactly", () => {
    // ∫_0^10 (2f) df = 100 → RMS 10; any grid that includes both ends gives exactly this.
    const f = [0, 1, 4, 10];
    expect(
      rmsFromPowerDensity(
        f,
        f.map((x) => 2 * x),
      ),
    ).toBeCloseTo(10, 12);
    // A single point spans no bandwidth.
    expect(rmsFromPowerDensity([1000], [1])).toBe(0);
  });

  it("A-weighted white noise over 20 Hz–20 kHz agrees with an independent Simpson integral of the IEC 61672-1 formula evaluated by mathjs", () => {
    // Independent of the module: the IEC 61672-1 formula (as printed in the reference notes) compiled by mathjs,
    // integrated by composite Simpson's rule in ln f (df = f·d(ln f)).
    const ra = compile("12194^2 * f^4 / ((f^2 + 20.6^2) * sqrt((f^2 + 107.7^2) * (f^2 + 737.9^2)) * (f^2 + 12194^2))");
    const gainSquared = (f: number) => {
      const g = (ra.evaluate({ f }) as number) * 10 ** (2.0 / 20);
      return g * g;
    };
    const intervals = 20000;
    const a = Math.log(20);
    const b = Math.log(20000);
    const h = (b - a) / intervals;
    let simpson = 0;
    for (let i = 0; i <= intervals; i++) {
      const f = Math.exp(a + i * h);
      const coefficient = i === 0 || i === intervals ? 1 : i % 2 === 1 ? 4 : 2;
      simpson += coefficient * gainSquared(f) * f;
    }
    const density = 10e-9;
    const expected = density * Math.sqrt((simpson * h) / 3);

    const grid = logFrequencyGrid(20, 20000, 1000);
    const psd = new Float64Array(grid.length).fill(density * density);
    const actual = rmsFromPowerDensity(grid, psd, "A");
    expect(Math.abs(actual / expected - 1)).toBeLessThan(INTEGRAL_RELATIVE_TOLERANCE);
    // A-weighting lowers a white-noise figure over 20 Hz–20 kHz by about 2 dB (common practice, from memory).
    const unweighted = density * Math.sqrt(19980);
    expect(20 * Math.log10(actual / unweighted)).toBeCloseTo(-2, 0);
  });

  it("Johnson–Nyquist √(4kTR): 1 kΩ at 300 K is 4.07 nV/√Hz (standard result)", () => {
    expect(thermalNoiseDensity(1000, 300) * 1e9).toBeCloseTo(4.07, 2);
  });

  it("rejects unsorted grids, mismatched lengths and negative densities with a message saying what to fix", () => {
    expect(() => rmsFromPowerDensity([10, 5], [1, 1])).toThrow(/sorted ascending/);
    expect(() => rmsFromPowerDensity([10, 20], [1])).toThrow(/one density per frequency/);
    expect(() => rmsFromPowerDensity([10, 20], [1, -1])).toThrow(RangeError);
    expect(() => rmsFromPowerDensity([], [])).toThrow(/empty/);
    expect(() => rmsFromPowerDensity([10, 20], [1, 1], "B" as never)).toThrow(/"A", "C" or "Z"/);
  });
});
