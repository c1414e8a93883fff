import { describe, expect, it } from "vitest";
import { compareNoise, densityToDbv } from "./compare-noise";

/**
 * Independent expectation: a JFET-like output noise of white floor e_w with a 1/f corner f_c,
 * e(f) = e_w·√(1 + f_c/f) (handbook form of flicker plus white noise), simulated with f_c = 100 Hz and "measured"
 * with f_c = 300 Hz and a floor 2 dB higher, so measured − simulated in dB is known in closed form at every f.
 */
const density = (f: number, floor: number, corner: number) => floor * Math.sqrt(1 + corner / f);
const logGrid = (from: number, to: number, perDecade: number) => {
  const n = Math.round(Math.log10(to / from) * perDecade);
  return Array.from({ length: n + 1 }, (_, i) => from * 10 ** (i / perDecade));
};
const FLOOR = 8e-9; // V/√Hz
const LIFT_DB = 2;
// The simulation is interpolated between points 1/200 decade apart; the error stays well under this (named tolerance).
const INTERPOLATION_TOLERANCE_DB = 1e-3;

describe("densityToDbv", () => {
  it("is 20·log10 of the density re 1 V/√Hz (dBV definition, common practice)", () => {
    expect(densityToDbv(1)).toBe(0);
    expect(densityToDbv(1e-8)).toBeCloseTo(-160, 12);
    expect(densityToDbv(0)).toBeNaN();
  });
});

describe("compareNoise against a closed-form expectation", () => {
  const simF = logGrid(10, 40_000, 200);
  const simulated = { frequency: simF, output_density: simF.map((f) => density(f, FLOOR, 100)) };
  const measF = Array.from({ length: 121 }, (_, i) => 20 * 2 ** (i / 12)).concat([50_000]);
  const lift = 10 ** (LIFT_DB / 20);
  // stored as dBV/√Hz, as the parser keeps a noise spectrum entered in V/√Hz
  const measured = { frequency: measF, level_db: measF.map((f) => 20 * Math.log10(density(f, FLOOR * lift, 300))) };
  const expected = (f: number) => LIFT_DB + 10 * Math.log10((1 + 300 / f) / (1 + 100 / f));

  it("gives the difference at every measured point inside the simulated range, without any alignment", () => {
    const result = compareNoise(simulated, measured, { fromHz: 20, toHz: 20_000 });
    if (!result.ok) throw new Error(result.message);
    const c = result.comparison;
    expect(c.frequency).not.toContain(50_000); // beyond the simulation: left out, never extrapolated
    expect(c.frequency).toHaveLength(121);
    for (const [i, f] of c.frequency.entries()) expect(Math.abs(c.difference_db[i] - expected(f))).toBeLessThan(INTERPOLATION_TOLERANCE_DB);
  });

  it("finds the largest deviation in a band where the hand computation puts it", () => {
    // expected(f) falls with f, so in [100 Hz, 1 kHz] the largest lies at the lowest measured point ≥ 100 Hz
    const result = compareNoise(simulated, measured, { fromHz: 1000, toHz: 100 });
    if (!result.ok) throw new Error(result.message);
    const first = measF.find((f) => f >= 100) as number;
    expect(result.comparison.max?.frequency).toBeCloseTo(first, 9);
    expect(result.comparison.max?.deviation_db).toBeCloseTo(expected(first), 3);
    expect(result.comparison.band).toEqual({ fromHz: 100, toHz: 1000 });
  });

  it("says what to do when the spectrum misses the simulated range", () => {
    const result = compareNoise(simulated, { frequency: [50_000, 60_000, 70_000], level_db: [-160, -160, -160] }, { fromHz: 20, toHz: 20_000 });
    expect(result).toEqual({ ok: false, message: expect.stringMatching(/outside the simulated noise range/) });
  });
});
