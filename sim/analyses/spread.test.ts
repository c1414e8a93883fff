import { describe, expect, it } from "vitest";
import type { AnalysisRequests, ElaboratedPart } from "../circuit/types";
import { runCircuit } from "../run";
import { SeededRandom } from "./random";
import { simulate } from "./simulate";
import { percentileOfSorted, summarise } from "./statistics";
import { circuit, part } from "./test-circuits";

const GAIN_ONLY: AnalysisRequests = {
  ac: { frequencies: { kind: "list", frequencies: [100, 1000] }, pressure: 1, temperature: 298.15 },
};

function toleranced(p: ElaboratedPart, tolerance: Record<string, number>, normal = false): ElaboratedPart {
  return { ...p, tolerance, toleranceDistribution: normal ? "normal" : "uniform" };
}

/** Divider of two equal resistors, each with its own tolerance (relative). */
function divider(t1: number, t2: number, runs: number, seed: number, normal = false) {
  return circuit(
    [
      part("V1", "vsource", { p: "in", n: "0" }, { dc: 1, ac: 1 }),
      toleranced(
        part("R1", "resistor", { a: "in", b: "out" }, { resistance: 10e3 }),
        t1 ? { resistance: t1 } : {},
        normal,
      ),
      toleranced(
        part("R2", "resistor", { a: "out", b: "0" }, { resistance: 10e3 }),
        t2 ? { resistance: t2 } : {},
        normal,
      ),
    ],
    { plus: "out" },
    { ...GAIN_ONLY, spread: { runs, seed } },
  );
}

const DB_PER_NEPER = 20 / Math.LN10;

describe("Monte Carlo spread", () => {
  // Divider r = R2/(R1 + R2) with R1 = R(1 + a), R2 = R(1 + b), a and b independent uniform on [−t, t].
  // Closed-form bounds: r ∈ [(1 − t)/2, (1 + t)/2]. First-order propagation (GUM, JCGM 100:2008, §5.1.2):
  // δr = (b − a)/4, Var(a) = t²/3, so sd(r) = t/√24, and in dB sd = (20/ln 10)·(sd(r)/r) = (20/ln 10)·t/√6.
  // Percentiles: b − a is triangular on [−2t, 2t], P(b − a ≤ −2t + s) = s²/(8t²), so its 5th percentile is
  // −2t + t·√0.4 and the 95th its mirror. Statistical tolerances for n = 4000 runs, at 4 standard errors:
  // mean: sd/√n; sd: √((κ − 1)/(4n)) relative, κ = 2.4 the triangular kurtosis (≈ 1.3 %, so 5.5 %);
  // quantile: √(p(1 − p)/n)/density(x_p) (≈ 2 % of |x_p|, so 8 %).
  const t = 0.01;
  const runs = 4000;
  const result = simulate(divider(t, t, runs, 20240611));
  const gain = result.spread!.figures.gain_1khz_db;

  it("stays inside the closed-form bounds and reaches near them", () => {
    const lower = 20 * Math.log10((1 - t) / 2);
    const upper = 20 * Math.log10((1 + t) / 2);
    expect(gain.min!).toBeGreaterThanOrEqual(lower - 1e-12);
    expect(gain.max!).toBeLessThanOrEqual(upper + 1e-12);
    // The observed range covers most of the possible one (triangular tails: a run lands in the outer 5 % of
    // either end with probability 0.05²/2; over 4000 runs that happens about 5 times).
    expect(gain.max! - gain.min!).toBeGreaterThan(0.9 * (upper - lower));
  });

  it("mean, sd and percentiles match first-order propagation within the statistical tolerance", () => {
    const sd = (DB_PER_NEPER * t) / Math.sqrt(6);
    const nominal = 20 * Math.log10(0.5);
    expect(Math.abs(gain.mean! - nominal)).toBeLessThan((4 * sd) / Math.sqrt(runs));
    expect(Math.abs(gain.sd! / sd - 1)).toBeLessThan(0.055);
    const x95 = 2 * t - t * Math.sqrt(0.4); // of b − a
    const p95 = nominal + DB_PER_NEPER * (x95 / 4 / 0.5);
    const p5 = nominal - DB_PER_NEPER * (x95 / 4 / 0.5);
    expect(Math.abs(gain.p95! - p95)).toBeLessThan(0.08 * (p95 - nominal));
    expect(Math.abs(gain.p5! - p5)).toBeLessThan(0.08 * (nominal - p5));
    expect(result.spread!.runs).toBe(runs);
    expect(result.spread!.failed_runs).toBeUndefined();
  });

  it("gives the envelope of |H| per ac frequency, and restores the nominal values", () => {
    const c = divider(t, t, 200, 3);
    const r = simulate(c);
    const env = r.spread!.envelope!;
    expect(env.frequency).toEqual([100, 1000]);
    for (let i = 0; i < 2; i++) {
      expect(env.min_db[i]).toBeLessThanOrEqual(env.p5_db[i]);
      expect(env.p5_db[i]).toBeLessThan(r.ac!.magnitude_db[i]);
      expect(env.p95_db[i]).toBeGreaterThan(r.ac!.magnitude_db[i]);
      expect(env.p95_db[i]).toBeLessThanOrEqual(env.max_db[i]);
    }
    expect(c.parts.map((p) => p.values.resistance)).toEqual([undefined, 10e3, 10e3]);
  });

  it("is reproducible for a seed, and a different seed gives different draws", () => {
    const a = simulate(divider(t, t, 300, 99)).spread;
    const b = simulate(divider(t, t, 300, 99)).spread;
    const c = simulate(divider(t, t, 300, 100)).spread;
    expect(a).toEqual(b);
    expect(c!.figures.gain_1khz_db.mean).not.toBe(a!.figures.gain_1khz_db.mean);
  });

  it("normal distribution: the tolerance is 3σ", () => {
    // Only R2 varies, δ normal with σ = t/3: δr = δ/4 at first order, so sd in dB = (20/ln 10)·(t/3)/2.
    // Sample sd of a normal sample: relative standard error 1/√(2n) ≈ 1.1 % at n = 4000; 4.5 % is 4 of them.
    const tn = 0.03;
    const r = simulate(divider(0, tn, 4000, 5, true));
    const sd = (DB_PER_NEPER * (tn / 3)) / 2;
    expect(Math.abs(r.spread!.figures.gain_1khz_db.sd! / sd - 1)).toBeLessThan(0.045);
  });
});

describe("spread through the circuit file", () => {
  const follower = (tolerance: Record<string, string>) => ({
    format: "backplate/circuit",
    version: 1,
    parameters: { RB: "1G" },
    parts: [
      { id: "VPOL", kind: "vsource", pins: { p: "pol", n: "0" }, values: { dc: "60" } },
      { id: "RPOL", kind: "resistor", pins: { a: "pol", b: "dia" }, values: { resistance: "RB" } },
      {
        id: "MIC",
        kind: "capsule",
        pins: { diaphragm: "dia", backplate: "0" },
        values: { capacitance: "50p", strain_per_pa: "2e-4" },
      },
      { id: "RG", kind: "resistor", pins: { a: "dia", b: "0" }, values: { resistance: "RB" } },
      {
        id: "J1",
        kind: "jfet",
        pins: { d: "vdd", g: "dia", s: "s" },
        values: { idss: "4m", pinch_off: "-2" },
        tolerance,
      },
      { id: "RS", kind: "resistor", pins: { a: "s", b: "0" }, values: { resistance: "2k2" } },
      { id: "VDD", kind: "vsource", pins: { p: "vdd", n: "0" }, values: { dc: "12" } },
    ],
    output: { plus: "s", minus: "0" },
    analyses: {
      op: {},
      ac: { frequencies: [100, 1000, 10000] },
      noise: { from: 20, to: 20000, points_per_decade: 10 },
      spread: { runs: 100, seed: 42 },
    },
  });

  it("varies a JFET's idss and pinch_off, and prints spread after the figures with every figure's statistics", () => {
    const doc = runCircuit(follower({ idss: "20%", pinch_off: "30%" }));
    expect(Object.keys(doc)).toEqual(["op", "ac", "noise", "figures", "spread"]);
    const z = doc.spread!.figures.output_impedance_1khz_ohm;
    // The follower's Zout = RS ∥ 1/gm (reference README) moves with gm, hence with idss and pinch_off.
    expect(z.sd!).toBeGreaterThan(0);
    expect(z.min!).toBeLessThan(doc.figures.output_impedance_1khz_ohm as number);
    expect(z.max!).toBeGreaterThan(doc.figures.output_impedance_1khz_ohm as number);
    expect(Object.keys(doc.spread!.figures)).toContain("self_noise_dba_spl");
    expect(doc.spread!.envelope!.frequency).toEqual([100, 1000, 10000]);
    const none = runCircuit(follower({}));
    // nothing varies: the runs repeat the nominal solve (to rounding: each is warm-started Newton)
    expect(none.spread!.figures.output_impedance_1khz_ohm.sd!).toBeLessThan(1e-9);
  });

  it("a sweep repeats the noise analysis: self_noise_dba_spl at every value", () => {
    // A larger bias resistor moves its noise below the audio band (reference README: the total is kT/C whatever
    // R is), so the A-weighted self-noise falls as RB rises.
    const file = follower({});
    const { spread: _none, ...analyses } = file.analyses;
    const doc = runCircuit({
      ...file,
      analyses: { ...analyses, sweep: { parameter: "RB", values: ["100M", "1G", "10G"] } },
    });
    const levels = doc.sweep!.map((p) => p.figures.self_noise_dba_spl as number);
    expect(levels.every((l) => typeof l === "number")).toBe(true);
    expect(levels[0]).toBeGreaterThan(levels[1]);
    expect(levels[1]).toBeGreaterThan(levels[2]);
  });
});

describe("seeded generator and statistics", () => {
  it("uniform and normal deviates have the textbook moments", () => {
    // Uniform on [0, 1): mean 1/2, variance 1/12; standard normal: mean 0, variance 1. n = 100,000: the mean's
    // standard error is 0.29/√n ≈ 0.0009 (uniform) and 0.0032 (normal); the tolerances are 5 of them.
    const rng = new SeededRandom(123);
    const n = 100_000;
    const u = Array.from({ length: n }, () => rng.uniform());
    const z = Array.from({ length: n }, () => rng.normal());
    const su = summarise(u);
    const sz = summarise(z);
    expect(Math.abs(su.mean! - 0.5)).toBeLessThan(0.0046);
    expect(Math.abs(su.sd! ** 2 - 1 / 12)).toBeLessThan(0.002);
    expect(su.min!).toBeGreaterThanOrEqual(0);
    expect(su.max!).toBeLessThan(1);
    expect(Math.abs(sz.mean!)).toBeLessThan(0.016);
    expect(Math.abs(sz.sd! - 1)).toBeLessThan(0.012);
    // Normal 95th percentile 1.6449 (any statistics table); quantile standard error ≈ 0.0068 here.
    expect(Math.abs(sz.p95! - 1.6449)).toBeLessThan(0.035);
  });

  it("percentiles are Hyndman–Fan type 7 (R's quantile default, NumPy's percentile default)", () => {
    // h = (n − 1)p: for 1, 2, 3, 4 the 5th percentile is 1 + 0.15·1 = 1.15 and the 95th 3.85.
    expect(percentileOfSorted([1, 2, 3, 4], 0.05)).toBeCloseTo(1.15, 12);
    expect(percentileOfSorted([1, 2, 3, 4], 0.95)).toBeCloseTo(3.85, 12);
    const s = summarise([4, Number.NaN, 1, 3, 2]);
    expect(s).toEqual({ mean: 2.5, sd: Math.sqrt(5 / 3), min: 1, max: 4, p5: s.p5, p95: s.p95 });
    expect(s.p5).toBeCloseTo(1.15, 12);
    expect(summarise([])).toEqual({ mean: null, sd: null, min: null, max: null, p5: null, p95: null });
  });
});
