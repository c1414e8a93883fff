import { describe, expect, it } from "vitest";
import { compareMeasurement, interpolateLogF, levelOffset, maxDeviation } from "./compare";

/** First-order high-pass magnitude, dB: 20·log10(f / √(f² + fc²)) (handbook formula for an RC high-pass). */
const highPassDb = (f: number, fc: number) => 20 * Math.log10(f / Math.sqrt(f * f + fc * fc));
const logGrid = (from: number, to: number, perDecade: number) => {
  const n = Math.round(Math.log10(to / from) * perDecade);
  return Array.from({ length: n + 1 }, (_, i) => from * 10 ** (i / perDecade));
};

describe("interpolateLogF", () => {
  it("is exact on a curve that is a straight line against log10 f (20 dB/decade)", () => {
    const x = logGrid(10, 100_000, 3);
    const y = x.map((f) => 20 * Math.log10(f));
    for (const f of [12.5, 999, 1234.5, 31_622]) expect(interpolateLogF(x, y, f)).toBeCloseTo(20 * Math.log10(f), 9);
  });
  it("returns the point itself at a grid frequency and NaN outside the range (no extrapolation)", () => {
    const x = [10, 100, 1000];
    const y = [1, 2, 3];
    expect(interpolateLogF(x, y, 100)).toBe(2);
    expect(interpolateLogF(x, y, 1000)).toBe(3);
    expect(interpolateLogF(x, y, 9.99)).toBeNaN();
    expect(interpolateLogF(x, y, 1001)).toBeNaN();
    // halfway on the log axis between 10 and 100 is √1000 ≈ 31.62 Hz
    expect(interpolateLogF(x, y, Math.sqrt(1000))).toBeCloseTo(1.5, 12);
  });
});

describe("compareMeasurement against an independently computed expectation", () => {
  // Simulation: 40 Hz high-pass, dense grid (200 points/decade). Measurement: the same stage built with a 60 Hz
  // corner, 7 dB louder on the rig, at 1/12-octave points from 20 Hz to 20 kHz.
  const simF = logGrid(10, 40_000, 200);
  const simulated = { frequency: simF, level_db: simF.map((f) => highPassDb(f, 40)) };
  const measF = Array.from({ length: 121 }, (_, i) => 20 * 2 ** (i / 12));
  const rigGainDb = 7;
  const measured = { frequency: measF, level_db: measF.map((f) => highPassDb(f, 60) + rigGainDb) };
  // By hand: aligned at 1 kHz, the difference is [H60(f) − H60(1k)] − [H40(f) − H40(1k)].
  const expectedDiff = (f: number) => highPassDb(f, 60) - highPassDb(1000, 60) - (highPassDb(f, 40) - highPassDb(1000, 40));
  // Interpolating the simulation between points 1/200 decade apart errs by far less than this (named tolerance).
  const INTERPOLATION_TOLERANCE_DB = 1e-3;

  it("offsets the measurement to meet the simulation at 1 kHz", () => {
    const expected = highPassDb(1000, 40) - (highPassDb(1000, 60) + rigGainDb);
    expect(levelOffset(simulated, measured)).toBeCloseTo(expected, 4);
  });

  it("finds the largest deviation in 20–200 Hz at 20 Hz with the hand-computed value", () => {
    const result = compareMeasurement(simulated, measured, { fromHz: 20, toHz: 200 });
    if (!result.ok) throw new Error(result.message);
    const { max, difference_db, frequency } = result.comparison;
    expect(max?.frequency).toBe(20);
    expect(Math.abs((max?.deviation_db ?? 0) - expectedDiff(20))).toBeLessThan(INTERPOLATION_TOLERANCE_DB);
    expect(expectedDiff(20)).toBeLessThan(-3); // the 60 Hz build is several dB down at 20 Hz
    for (const [i, f] of frequency.entries()) expect(Math.abs(difference_db[i] - expectedDiff(f))).toBeLessThan(INTERPOLATION_TOLERANCE_DB);
  });

  it("inside 1–10 kHz both curves are flat, so the deviation there is tiny and at the band's low edge", () => {
    const result = compareMeasurement(simulated, measured, { fromHz: 10_000, toHz: 1000 });
    if (!result.ok) throw new Error(result.message);
    const max = result.comparison.max;
    const inBand = measF.filter((f) => f >= 1000 && f <= 10_000);
    const byHand = Math.max(...inBand.map((f) => Math.abs(expectedDiff(f))));
    expect(Math.abs(Math.abs(max?.deviation_db ?? 0) - byHand)).toBeLessThan(INTERPOLATION_TOLERANCE_DB);
    expect(result.comparison.band).toEqual({ fromHz: 1000, toHz: 10_000 });
  });

  it("leaves out measured points beyond the simulated range and refuses an alignment neither covers", () => {
    const shortSim = { frequency: logGrid(100, 10_000, 50), level_db: logGrid(100, 10_000, 50).map(() => 0) };
    const result = compareMeasurement(shortSim, measured, { fromHz: 20, toHz: 20_000 });
    if (!result.ok) throw new Error(result.message);
    expect(Math.min(...result.comparison.frequency)).toBeGreaterThanOrEqual(100);
    expect(Math.max(...result.comparison.frequency)).toBeLessThanOrEqual(10_000);
    const refused = compareMeasurement(shortSim, measured, { alignHz: 50, fromHz: 20, toHz: 200 });
    expect(refused.ok).toBe(false);
  });
});

describe("maxDeviation", () => {
  it("takes the largest magnitude, keeps its sign, and includes the band's edges", () => {
    expect(maxDeviation([10, 20, 30, 40], [0.5, -2, 1.5, 9], 10, 30)).toEqual({ frequency: 20, deviation_db: -2 });
    expect(maxDeviation([10, 20, 30], [0.5, -2, 1.5], 31, 40)).toBeNull();
  });
});
