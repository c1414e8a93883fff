import { describe, expect, it } from "vitest";
import * as calculators from "./index";

describe("calculators entry point", () => {
  it("exposes one function per calculator family, and each rejects a bad input with a RangeError", () => {
    // One representative per family; a missing export would be `undefined` and fail here.
    const badCalls: (() => unknown)[] = [
      () => calculators.aWeightingDb(-1),
      () => calculators.pascalsToSpl(0),
      () => calculators.rmsFromPowerDensity([], []),
      () => calculators.thermalNoiseDensity(Number.NaN),
      () => calculators.parallelPlateCapacitance(1e-3, 0),
      () => calculators.biasHighPassCorner(0, 1e-12),
      () => calculators.phantomVoltageAtMicrophone(calculators.PHANTOM_SYSTEMS.P48, Number.POSITIVE_INFINITY),
      () => calculators.cableCapacitance(0),
      () => calculators.noiseFactor({ voltageNoiseDensity: 1e-9 }, -50),
    ];
    for (const call of badCalls) expect(call).toThrow(RangeError);
  });

  it("the families compose into an equivalent noise level for the reference-notes capsule with 1 GΩ bias", () => {
    // Reference-notes capsule (a = 6.35 mm, d = 20 µm, T = 10 kN/m, 200 V): C0 ≈ 56.08 pF, M ≈ 5.0 mV/Pa.
    // Reference notes: 1 GΩ with 50 pF gives ≈ 0.66 µV A-weighted; in band (2πfRC ≫ 1) the density goes as 1/C,
    // so with C0 it is ≈ 0.66 µV · 50/56.08. Taking the bias noise as the only noise (IEC 60268-4):
    // L = 20·log10(0.66e-6 · 50/56.08 / (5.0e-3 · 20e-6)) = 15.39 dB(A). The quoted figures' rounding
    // (0.66 ± 0.005 µV, 5.0 ± 0.05 mV/Pa) is worth about ±0.16 dB.
    const compositionToleranceDb = 0.2;
    const c0 = calculators.parallelPlateCapacitance(6.35e-3, 20e-6);
    const m = calculators.openCircuitSensitivity(200, 6.35e-3, 10e3, 20e-6);
    const vn = calculators.biasNoiseWeightedRms(1e9, c0, { temperatureK: 298.15 });
    const expected = 20 * Math.log10((0.66e-6 * (50e-12 / c0)) / (5.0e-3 * 20e-6));
    expect(Math.abs(calculators.equivalentNoiseLevel(vn, m) - expected)).toBeLessThan(compositionToleranceDb);
  });
});
