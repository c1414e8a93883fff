import { describe, expect, it } from "vitest";
import {
  inputReferredDensity,
  noiseFactor,
  noiseFigureDb,
  optimumNoiseMatch,
  totalInputNoiseDensity,
} from "./noise-figure";
import { dbuToVolts, thermalNoiseRms, voltsToDbu } from "./thermal-noise";

/** The reference notes quote the 150 Ω figure rounded to 1 dB. */
const DBU_ROUNDING_TOLERANCE = 0.5;

// Worked example, by hand (Friis 1944 definition of noise factor; T0 = 290 K per the IRE/IEEE definition, from
// memory). Amplifier e_n = 2 nV/√Hz, i_n = 1 pA/√Hz, source R_s = 200 Ω:
//   4kT0 = 4 · 1.380649e-23 · 290 = 1.601553e-20 J;   4kT0·R_s = 3.203106e-18 V²/Hz  (1.790 nV/√Hz)
//   e_n² / (4kT0·R_s) = 4e-18 / 3.203106e-18 = 1.248788
//   i_n²·R_s / (4kT0) = 1e-24 · 200 / 1.601553e-20 = 0.012488
//   F = 1 + 1.248788 + 0.012488 = 2.261276;   NF = 10·log10 2.261276 = 3.5435 dB
//   Optimum: R_opt = e_n/i_n = 2 kΩ;  F_min = 1 + e_n·i_n/(2kT0) = 1 + 2e-21/8.007765e-21 = 1.249758 → 0.968 dB
const AMPLIFIER = { voltageNoiseDensity: 2e-9, currentNoiseDensity: 1e-12 };

describe("noise factor and noise figure (Friis definition)", () => {
  it("reproduces the hand-worked example: F = 2.2613, NF = 3.544 dB", () => {
    expect(noiseFactor(AMPLIFIER, 200)).toBeCloseTo(2.261276, 6);
    expect(noiseFigureDb(AMPLIFIER, 200)).toBeCloseTo(3.5435, 4);
  });

  it("F equals the total input noise power over the source's own 4kTR_s", () => {
    const total = totalInputNoiseDensity(AMPLIFIER, 200);
    expect((total * total) / 3.203106e-18).toBeCloseTo(noiseFactor(AMPLIFIER, 200), 5);
  });

  it("noise matching: R_opt = e_n/i_n = 2 kΩ, F_min = 1.24976 (0.968 dB), and F is larger on either side", () => {
    const match = optimumNoiseMatch(AMPLIFIER);
    expect(match.sourceResistanceOhm).toBeCloseTo(2000, 9);
    expect(match.minimumNoiseFactor).toBeCloseTo(1.249758, 6);
    expect(match.minimumNoiseFigureDb).toBeCloseTo(0.9683, 4);
    expect(noiseFactor(AMPLIFIER, 2000)).toBeCloseTo(match.minimumNoiseFactor, 12);
    expect(noiseFactor(AMPLIFIER, 1900)).toBeGreaterThan(match.minimumNoiseFactor);
    expect(noiseFactor(AMPLIFIER, 2100)).toBeGreaterThan(match.minimumNoiseFactor);
  });

  it("a noiseless amplifier has F = 1 (0 dB) — the definition's floor", () => {
    expect(noiseFigureDb({ voltageNoiseDensity: 0 }, 150)).toBe(0);
  });

  it("rejects bad inputs with a RangeError", () => {
    expect(() => noiseFactor(AMPLIFIER, 0)).toThrow(/Source resistance must be/);
    expect(() => noiseFactor({ voltageNoiseDensity: -1e-9 }, 150)).toThrow(/Voltage-noise density/);
    expect(() => optimumNoiseMatch({ voltageNoiseDensity: 1e-9 })).toThrow(/Current-noise density/);
  });
});

describe("input-referred noise of a stage", () => {
  it("is the output density over |gain|, for real and complex gains", () => {
    // 100 nV/√Hz at the output of a ×−20 stage is 5 nV/√Hz at its input; |3 + 4j| = 5.
    expect(inputReferredDensity(100e-9, -20)).toBeCloseTo(5e-9, 20);
    expect(inputReferredDensity(100e-9, { re: 3, im: 4 })).toBeCloseTo(20e-9, 20);
    expect(() => inputReferredDensity(1e-9, 0)).toThrow(/Gain magnitude/);
  });
});

describe("thermal noise of a 150 Ω source (reference notes: −131 dBu over 20 kHz, from √(4kTRB))", () => {
  it.each([[290], [298.15], [300]])("is −131 dBu to the quoted rounding at %f K", (t) => {
    expect(Math.abs(voltsToDbu(thermalNoiseRms(150, 20000, t)) - -131)).toBeLessThan(DBU_ROUNDING_TOLERANCE);
  });

  it("0 dBu is 0.7746 V (1 mW into 600 Ω, common practice)", () => {
    expect(dbuToVolts(0)).toBeCloseTo(0.7746, 4);
    expect(voltsToDbu(dbuToVolts(-60))).toBeCloseTo(-60, 10);
  });
});
