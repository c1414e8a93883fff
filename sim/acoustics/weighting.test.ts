import { describe, expect, it } from "vitest";
import { aWeightingDb, aWeightingGain } from "./a-weighting";
import { cWeightingDb, cWeightingGain } from "./c-weighting";
import { weightingByName, weightingDbs, weightingGains } from "./weighting";
import { zWeightingDb, zWeightingGain } from "./z-weighting";

/** The standard tabulates the weightings to 0.1 dB; the analytic form must round to the table. */
const TABLE_TOLERANCE_DB = 0.1;

/** One-third-octave base-ten band centre: 1000·10^(n/10) Hz (IEC 61260-1; the table uses exact, not label, values). */
const bandCentreHz = (n: number) => 1000 * 10 ** (n / 10);

/** Band indices n = −20 (10 Hz) … +13 (≈ 20 kHz). */
const BAND_INDICES = Array.from({ length: 34 }, (_, i) => i - 20);

// IEC 61672-1 A-weighting table, 10 Hz … 20 kHz, dB (copied from the project's reference notes, source IEC 61672-1).
const IEC_61672_A_TABLE_DB = [
  -70.4, -63.4, -56.7, -50.5, -44.7, -39.4, -34.6, -30.2, -26.2, -22.5, -19.1, -16.1, -13.4, -10.9, -8.6, -6.6, -4.8,
  -3.2, -1.9, -0.8, 0.0, 0.6, 1.0, 1.2, 1.3, 1.2, 1.0, 0.5, -0.1, -1.1, -2.5, -4.3, -6.6, -9.3,
];

// IEC 61672-1 C-weighting table, 10 Hz … 20 kHz, dB — from memory (not checked against the printed standard),
// hence compared with the same 0.1 dB tolerance as the table's own rounding.
const IEC_61672_C_TABLE_DB_FROM_MEMORY = [
  -14.3, -11.2, -8.5, -6.2, -4.4, -3.0, -2.0, -1.3, -0.8, -0.5, -0.3, -0.2, -0.1, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0,
  0.0, 0.0, -0.1, -0.2, -0.3, -0.5, -0.8, -1.3, -2.0, -3.0, -4.4, -6.2, -8.5, -11.2,
];

describe("A-weighting (IEC 61672-1)", () => {
  it.each(BAND_INDICES.map((n, i) => [bandCentreHz(n), IEC_61672_A_TABLE_DB[i]]))(
    "at %f Hz matches the standard's table (%f dB) to 0.1 dB",
    (f, tableDb) => {
      expect(Math.abs(aWeightingDb(f) - tableDb)).toBeLessThanOrEqual(TABLE_TOLERANCE_DB + 1e-9);
    },
  );

  it("distinguishes the 12.5 Hz band label from the exact 12.589 Hz centre (reference notes: −63.6 vs −63.4 dB)", () => {
    expect(aWeightingDb(12.5)).toBeCloseTo(-63.6, 1);
    expect(aWeightingDb(bandCentreHz(-19))).toBeCloseTo(-63.4, 1);
  });

  it("is 0 dB at 1 kHz to within the normalisation's rounding (IEC 61672-1: +2.00 dB normalisation)", () => {
    expect(Math.abs(aWeightingDb(1000))).toBeLessThan(0.01);
  });

  it("gives the linear gain that matches its dB value, and 0 at DC", () => {
    for (const f of [31.5, 1000, 8000]) expect(20 * Math.log10(aWeightingGain(f))).toBeCloseTo(aWeightingDb(f), 10);
    expect(aWeightingGain(0)).toBe(0);
  });

  it("rejects negative, non-finite and (for dB) zero frequencies with a RangeError", () => {
    expect(() => aWeightingGain(-1)).toThrow(RangeError);
    expect(() => aWeightingGain(Number.NaN)).toThrow(RangeError);
    expect(() => aWeightingDb(0)).toThrow(/greater than 0 Hz/);
  });
});

describe("C-weighting (IEC 61672-1)", () => {
  it.each(BAND_INDICES.map((n, i) => [bandCentreHz(n), IEC_61672_C_TABLE_DB_FROM_MEMORY[i]]))(
    "at %f Hz matches the table recalled from memory (%f dB) to 0.1 dB",
    (f, tableDb) => {
      expect(Math.abs(cWeightingDb(f) - tableDb)).toBeLessThanOrEqual(TABLE_TOLERANCE_DB + 1e-9);
    },
  );

  it("is 0 dB at 1 kHz (+0.06 dB normalisation) and its gain agrees with its dB value", () => {
    expect(Math.abs(cWeightingDb(1000))).toBeLessThan(0.01);
    expect(20 * Math.log10(cWeightingGain(100))).toBeCloseTo(cWeightingDb(100), 10);
  });
});

describe("Z-weighting and the weighting interface", () => {
  it("Z is flat 0 dB, gain 1 (IEC 61672-1)", () => {
    expect(zWeightingGain(5)).toBe(1);
    expect(zWeightingDb(20000)).toBe(0);
  });

  it("weights a Float64Array grid point by point", () => {
    const grid = new Float64Array([bandCentreHz(-10), 1000, bandCentreHz(10)]);
    const dbs = weightingDbs("A", grid);
    expect(Array.from(dbs).map((v) => Math.round(v * 10) / 10)).toEqual([-19.1, 0, -2.5]);
    const gains = weightingGains(weightingByName("C"), grid);
    expect(gains[1]).toBeCloseTo(1, 3);
    expect(gains).toBeInstanceOf(Float64Array);
  });

  it("rejects an unknown weighting name", () => {
    expect(() => weightingByName("B")).toThrow(/use "A", "C" or "Z"/);
  });
});
