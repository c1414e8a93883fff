import { readdirSync, readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { elaborate } from "../circuit/elaborate";
import { expandFrequencies } from "../circuit/frequencies";
import type { ElaboratedCircuit, ElaboratedPart } from "../circuit/types";
import { runAc } from "./ac";
import { compileCircuit } from "./compile";
import {
  CORNER_HIGHEST_HZ,
  CORNER_LOWEST_HZ,
  CORNER_RELATIVE_TOLERANCE,
  findCorner,
  findCornerFromSweep,
  REFERENCE_FREQUENCY_HZ,
} from "./corners";
import { computeFigures } from "./figures";
import { OperatingPointSolver } from "./op";
import { SmallSignalModel } from "./small-signal";
import { circuit, part } from "./test-circuits";

/** The contract's corner accuracy: the fast path and the search must agree to this (relative). */
const CONTRACT_CORNER_TOLERANCE = 1e-3;

function model(c: ElaboratedCircuit): SmallSignalModel {
  const compiled = compileCircuit(c);
  return new SmallSignalModel(compiled, new OperatingPointSolver(compiled).solve());
}

/** Corners by the search alone and bracketed from a sweep over `frequencies` of the same model. */
function bothWays(m: SmallSignalModel, frequencies: ArrayLike<number>, pressure = 1) {
  const search = computeFigures(m, pressure);
  const fast = computeFigures(m, pressure, runAc(m, frequencies, pressure));
  return { search, fast };
}

function expectSameCorner(fast: unknown, search: unknown): void {
  if (search === null) {
    expect(fast).toBeNull();
    return;
  }
  expect(typeof fast).toBe("number");
  expect(Math.abs((fast as number) / (search as number) - 1)).toBeLessThan(CONTRACT_CORNER_TOLERANCE);
}

function logGridList(from: number, to: number, perDecade: number): number[] {
  return Array.from(expandFrequencies({ kind: "grid", from, to, pointsPerDecade: perDecade }));
}

describe("corners from a sweep", () => {
  // First-order low-pass at fc: |H|² = 1/(1 + (f/fc)²); |H|² = |H(1 kHz)|²/2 at f = √(fc² + 2·(1 kHz)²).
  const cutoff = 3000;
  const lowPass = (f: number) => 1 / Math.sqrt(1 + (f / cutoff) ** 2);
  const exact = Math.sqrt(cutoff ** 2 + 2 * REFERENCE_FREQUENCY_HZ ** 2);
  const target = lowPass(REFERENCE_FREQUENCY_HZ) / Math.SQRT2;
  const sampled = (frequency: number[]) => ({
    frequency,
    re: frequency.map(lowPass),
    im: frequency.map(() => 0),
  });

  it("finds the crossing to the contract's tolerance in fewer solves than the search", () => {
    let searchSolves = 0;
    const searched = findCorner(
      (f) => {
        searchSolves++;
        return lowPass(f);
      },
      target,
      CORNER_HIGHEST_HZ,
    );
    let fastSolves = 0;
    const fast = findCornerFromSweep(
      (f) => {
        fastSolves++;
        return lowPass(f);
      },
      target,
      CORNER_HIGHEST_HZ,
      sampled(logGridList(1, 1e5, 20)),
    );
    expect(Math.abs(searched! / exact - 1)).toBeLessThan(CORNER_RELATIVE_TOLERANCE);
    expect(Math.abs(fast! / exact - 1)).toBeLessThan(CORNER_RELATIVE_TOLERANCE);
    // The search walks ~10 grid points to 3.3 kHz and bisects ~11 times; Brent needs a handful.
    expect(searchSolves).toBeGreaterThan(15);
    expect(fastSolves).toBeLessThanOrEqual(8);
  });

  it("takes the search over where the sweep stops short or is coarser than the search grid", () => {
    for (const frequency of [logGridList(1, 2000, 20), logGridList(1, 1e5, 2), [10, 5e4], []]) {
      const fast = findCornerFromSweep(lowPass, target, CORNER_HIGHEST_HZ, sampled(frequency));
      expect(Math.abs(fast! / exact - 1)).toBeLessThan(CORNER_RELATIVE_TOLERANCE);
    }
    // No crossing below 1 kHz for a low-pass, with or without the sweep.
    expect(findCornerFromSweep(lowPass, target, CORNER_LOWEST_HZ, sampled(logGridList(1, 1e5, 20)))).toBeNull();
  });

  it("reads an unsorted sweep in frequency order", () => {
    const frequency = logGridList(1, 1e5, 20).reverse();
    const fast = findCornerFromSweep(lowPass, target, CORNER_HIGHEST_HZ, sampled(frequency));
    expect(Math.abs(fast! / exact - 1)).toBeLessThan(CORNER_RELATIVE_TOLERANCE);
  });
});

describe("sweep-bracketed corners agree with the search on the examples", () => {
  const dir = new URL("../examples/", import.meta.url);
  const files = readdirSync(dir).filter((f) => f.endsWith(".json"));
  for (const file of files) {
    it(file, () => {
      const raw = JSON.parse(readFileSync(new URL(file, dir), "utf8"));
      const c = elaborate(raw);
      const m = model(c);
      const pressure = c.analyses.ac?.pressure ?? 1;
      const sweeps = [
        c.analyses.ac ? Array.from(expandFrequencies(c.analyses.ac.frequencies)) : logGridList(1, 1e5, 20),
        // the bench's 200-point list, not aligned with the search grid
        Array.from({ length: 200 }, (_, i) => 10 ** ((5 * i) / 199)),
        logGridList(10, 1e6, 40),
      ];
      for (const frequencies of sweeps) {
        const { search, fast } = bothWays(m, frequencies, pressure);
        expectSameCorner(fast.low_corner_hz, search.low_corner_hz);
        expectSameCorner(fast.high_corner_hz, search.high_corner_hz);
        expect(fast.gain_1khz_db).toBe(search.gain_1khz_db);
      }
    });
  }
});

describe("sweep-bracketed corners agree with the search on random RC and RL networks", () => {
  /** One section: a series element to the next node and a shunt element from it to ground. */
  interface Section {
    seriesKind: "resistor" | "reactive";
    shuntKind: "resistor" | "reactive";
    series: number;
    shunt: number;
  }
  const value = fc.double({ min: -3, max: 3, noNaN: true }).map((e) => 10 ** e);
  const section = fc.record({
    seriesKind: fc.constantFrom<Section["seriesKind"]>("resistor", "reactive"),
    shuntKind: fc.constantFrom<Section["shuntKind"]>("resistor", "reactive"),
    series: value,
    shunt: value,
  });

  /**
   * A ladder driven by a 1 V ac source. Reactive elements are capacitors (RC) or inductors (RL); values are
   * scaled so their impedance at 1 kHz is the drawn value times 1 kΩ, which puts the corners near the band.
   * Every node has a 1 GΩ leak to ground (a DC path under capacitors) and every inductor a little series
   * resistance (no source–inductor loop at DC).
   */
  function ladder(family: "rc" | "rl", sections: Section[]): ElaboratedCircuit {
    const omega = 2 * Math.PI * REFERENCE_FREQUENCY_HZ;
    const parts: ElaboratedPart[] = [part("V1", "vsource", { p: "n0", n: "0" }, { dc: 0, ac: 1 })];
    const element = (id: string, kind: Section["seriesKind"], a: string, b: string, ohms: number) => {
      const z = ohms * 1e3;
      if (kind === "resistor") return part(id, "resistor", { a, b }, { resistance: z });
      if (family === "rc") return part(id, "capacitor", { a, b }, { capacitance: 1 / (omega * z) });
      return part(id, "inductor", { a, b }, { inductance: z / omega, series_resistance: z * 1e-3 });
    };
    sections.forEach((s, i) => {
      const from = `n${i}`;
      const to = `n${i + 1}`;
      parts.push(element(`S${i}`, s.seriesKind, from, to, s.series));
      parts.push(element(`P${i}`, s.shuntKind, to, "0", s.shunt));
      parts.push(part(`G${i}`, "resistor", { a: to, b: "0" }, { resistance: 1e9 }));
    });
    return circuit(parts, { plus: `n${sections.length}` });
  }

  it("to the contract's 0.1 %, for sweeps finer and coarser than the search grid", () => {
    fc.assert(
      fc.property(
        fc.constantFrom<"rc" | "rl">("rc", "rl"),
        fc.array(section, { minLength: 1, maxLength: 5 }),
        fc.record({
          from: fc.double({ min: -1, max: 2.5, noNaN: true }),
          to: fc.double({ min: 3.5, max: 6, noNaN: true }),
          perDecade: fc.integer({ min: 5, max: 40 }),
        }),
        (family, sections, grid) => {
          const m = model(ladder(family, sections));
          const { search, fast } = bothWays(m, logGridList(10 ** grid.from, 10 ** grid.to, grid.perDecade));
          expectSameCorner(fast.low_corner_hz, search.low_corner_hz);
          expectSameCorner(fast.high_corner_hz, search.high_corner_hz);
        },
      ),
      { numRuns: 200, seed: 20250917 },
    );
  });
});
