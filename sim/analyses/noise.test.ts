import { readFileSync } from "node:fs";
import { complex, lusolve, matrix } from "mathjs";
import { describe, expect, it } from "vitest";
import { noiseFactor } from "../calculators/noise-figure";
import { elaborate } from "../circuit/elaborate";
import type { AnalysisRequests, ElaboratedCircuit } from "../circuit/types";
import type { AcStampContext } from "../devices/device";
import { compileCircuit } from "./compile";
import { noiseSpectrum } from "./noise";
import { AdjointNoiseSystem } from "./noise-adjoint";
import { inputReferredNoise } from "./noise-figures";
import { OperatingPointSolver } from "./op";
import { simulate } from "./simulate";
import { circuit, part } from "./test-circuits";

const K = 1.380649e-23; // Boltzmann constant, J/K (SI 2019, exact)

function noiseGrid(from: number, to: number, pointsPerDecade: number, temperature = 298.15): AnalysisRequests["noise"] {
  return { frequencies: { kind: "grid", from, to, pointsPerDecade }, temperature };
}
function noiseAt(frequencies: number[], temperature = 298.15): AnalysisRequests["noise"] {
  return { frequencies: { kind: "list", frequencies }, temperature };
}

/** IEC 61672-1 Annex E A-weighting, written out here independently of sim/acoustics (linear gain). */
function aWeighting(f: number): number {
  const f2 = f * f;
  const ra =
    (12194 ** 2 * f2 * f2) / ((f2 + 20.6 ** 2) * Math.sqrt((f2 + 107.7 ** 2) * (f2 + 737.9 ** 2)) * (f2 + 12194 ** 2));
  return ra * 10 ** (2 / 20);
}

/** Composite Simpson rule of g over [a, b] with n (even) equal intervals, linear in f. */
function simpson(g: (f: number) => number, a: number, b: number, n: number): number {
  const h = (b - a) / n;
  let sum = g(a) + g(b);
  for (let i = 1; i < n; i++) sum += (i % 2 ? 4 : 2) * g(a + i * h);
  return (sum * h) / 3;
}

/** Contract trapezoid (linear in f, both ends) of a closed-form density on given points, computed here. */
function trapezoid(frequencies: number[], density: (f: number) => number): number {
  let sum = 0;
  for (let i = 1; i < frequencies.length; i++) {
    sum += 0.5 * (frequencies[i] - frequencies[i - 1]) * (density(frequencies[i]) + density(frequencies[i - 1]));
  }
  return sum;
}

describe("noise analysis", () => {
  it("Johnson–Nyquist: 1 kΩ at 300 K is √(4kTR) = 4.07 nV/√Hz", () => {
    // Johnson (1928), Nyquist (1928): e = √(4kTR); 1 kΩ at 300 K gives 4.07 nV/√Hz (reference README).
    const c = circuit(
      [part("R1", "resistor", { a: "out", b: "0" }, { resistance: 1000 })],
      { plus: "out" },
      {
        noise: noiseAt([10, 1000, 100_000], 300),
      },
    );
    const noise = simulate(c).noise!;
    for (const d of noise.output_density) {
      expect(d).toBeCloseTo(4.07e-9, 11);
      expect(d / Math.sqrt(4 * K * 300 * 1000) - 1).toBeLessThan(1e-12);
    }
    expect(noise.contributions.R1).toEqual(noise.output_density);
  });

  it("resistor noise across a capacitance integrates to kT/C over a wide band", () => {
    // Standard result (equipartition; reference README): ∫ 4kTR/(1 + (2πfRC)²) df from 0 to ∞ = kT/C, whatever R.
    // The band 1e-4·fc … 1e5·fc leaves out (2/π)(1e-4 + 1e-5) ≈ 7e-5 of the power; 0.1 % tolerance covers it.
    const R = 10e3;
    const C = 1e-9;
    const fc = 1 / (2 * Math.PI * R * C);
    const c = circuit(
      [
        part("R1", "resistor", { a: "out", b: "0" }, { resistance: R }),
        part("C1", "capacitor", { a: "out", b: "0" }, { capacitance: C }),
      ],
      { plus: "out" },
      { noise: noiseGrid(fc * 1e-4, fc * 1e5, 100) },
    );
    const noise = simulate(c).noise!;
    const kTC = (K * 298.15) / C;
    expect(noise.rms! ** 2 / kTC).toBeGreaterThan(1 - 1e-3);
    expect(noise.rms! ** 2 / kTC).toBeLessThan(1 + 1e-3);
  });

  const biasNetwork = (analyses: AnalysisRequests, extra = false): ElaboratedCircuit =>
    circuit(
      [
        part("V1", "vsource", { p: "pol", n: "0" }, { dc: 60 }),
        part("R1", "resistor", { a: "pol", b: "dia" }, { resistance: 1e9 }),
        part("MIC", "capsule", { diaphragm: "dia", backplate: "0" }, { capacitance: 50e-12, strain_per_pa: 2e-4 }),
        ...(extra ? [part("E1", "vcvs", { p: "out", n: "0", cp: "dia", cn: "0" }, { gain: 1 })] : []),
      ],
      { plus: extra ? "out" : "dia" },
      analyses,
    );

  it("bias resistor at the capsule: 1 GΩ with 50 pF is ≈ 12.9 nV/√Hz at 1 kHz and ≈ 0.66 µV A-weighted", () => {
    // Reference README (Johnson–Nyquist noise of R low-passed by C): 12.9 nV/√Hz at 1 kHz, 0.66 µV A-weighted over
    // 20 Hz–20 kHz at 298.15 K (published to two figures: ±0.005 µV).
    const spot = simulate(biasNetwork({ noise: noiseAt([1000]) })).noise!;
    expect(spot.output_density[0]).toBeCloseTo(12.9e-9, 10);
    const band = simulate(biasNetwork({ noise: noiseGrid(20, 20_000, 200) })).noise!;
    expect(Math.abs(band.rms_a_weighted! - 0.66e-6)).toBeLessThan(0.005e-6);
  });

  it("A-weighted white noise over 20 Hz–20 kHz matches an independent numerical integral", () => {
    // IEC 61672-1 A-weighting squared times a flat 4kTR, integrated here by Simpson's rule on 200,000 equal
    // intervals; the engine's trapezoid on 100 points per decade agrees to 0.1 % (smooth integrand).
    const c = circuit(
      [part("R1", "resistor", { a: "out", b: "0" }, { resistance: 1000 })],
      { plus: "out" },
      {
        noise: noiseGrid(20, 20_000, 100),
      },
    );
    const noise = simulate(c).noise!;
    const white = 4 * K * 298.15 * 1000;
    const expectedA = Math.sqrt(simpson((f) => white * aWeighting(f) ** 2, 20, 20_000, 200_000));
    expect(noise.rms_a_weighted! / expectedA - 1).toBeLessThan(1e-3);
    expect(noise.rms_a_weighted! / expectedA - 1).toBeGreaterThan(-1e-3);
    // Unweighted: √(4kTR·B), B = 19,980 Hz, exact for a flat density under the trapezoid rule.
    expect(noise.rms! / Math.sqrt(white * 19_980) - 1).toBeLessThan(1e-12);
  });

  it("self-noise of capsule + bias resistor + ideal buffer matches a hand computation (IEC 60268-4)", () => {
    // Hand computation: M = V0·s·|jωτ/(1 + jωτ)| at 1 kHz (constant-charge capsule behind R, τ = RC); the output
    // noise is the bias noise 4kTR/(1 + (ωτ)²) through the unity buffer; L = 20·log10(e_A / (M·20 µPa)).
    const grid = noiseGrid(20, 20_000, 20);
    const r = simulate(biasNetwork({ op: { temperature: 298.15 }, noise: grid }, true));
    const tau = 1e9 * 50e-12;
    const wt = 2 * Math.PI * 1000 * tau;
    const sensitivity = ((60 * 2e-4 * wt) / Math.sqrt(1 + wt * wt)) * 1;
    expect(r.figures.sensitivity_v_per_pa! / sensitivity - 1).toBeLessThan(1e-9);
    const frequencies = r.noise!.frequency;
    const density = (f: number) => ((4 * K * 298.15 * 1e9) / (1 + (2 * Math.PI * f * tau) ** 2)) * aWeighting(f) ** 2;
    const eA = Math.sqrt(trapezoid(frequencies, density));
    const level = 20 * Math.log10(eA / (sensitivity * 20e-6));
    expect(r.figures.self_noise_dba_spl).toBeCloseTo(level, 6);
    // Studio condensers sit at about 4–20 dB(A) (reference README, common practice); this bare network does too.
    expect(level).toBeGreaterThan(4);
    expect(level).toBeLessThan(20);
  });

  it("self_noise_dba_spl is null without a capsule, and without the noise analysis", () => {
    const c = circuit(
      [part("R1", "resistor", { a: "out", b: "0" }, { resistance: 1000 })],
      { plus: "out" },
      {
        noise: noiseAt([1000]),
      },
    );
    expect(simulate(c).figures.self_noise_dba_spl).toBeNull();
    expect(simulate(biasNetwork({ op: { temperature: 298.15 } })).figures.self_noise_dba_spl).toBeNull();
  });

  it("contributions sum in power to the total; noiseless turns a part's noise off", () => {
    const c = biasNetwork({ noise: noiseGrid(20, 20_000, 10) });
    const both = simulate(c).noise!;
    const quiet = { ...c, parts: c.parts.map((p) => (p.id === "R1" ? { ...p, noiseless: true } : p)) };
    const none = simulate(quiet).noise!;
    expect(Object.keys(both.contributions)).toEqual(["R1"]);
    expect(none.contributions).toEqual({});
    expect(none.output_density.every((d) => d === 0)).toBe(true);
    expect(none.rms).toBe(0);
  });

  it("the adjoint result equals brute-force forward solves per source (mathjs lusolve on the same matrices)", () => {
    // Independent check: for every noise generator, build its right-hand side, solve A·v = b with mathjs and
    // take |V_out|²·psd; the per-part sums must equal the engine's single adjoint solve per frequency.
    const url = new URL("../examples/demo-microphone.json", import.meta.url);
    const demo = elaborate(JSON.parse(readFileSync(url, "utf8")));
    const compiled = compileCircuit(demo);
    const op = new OperatingPointSolver(compiled).solve();
    const system = new AdjointNoiseSystem(compiled, op);
    const frequencies = [20, 1000, 15_000];
    const spectrum = noiseSpectrum(system, frequencies);
    const n = compiled.unknowns.length;
    const g = new Float64Array(n * n);
    const c = new Float64Array(n * n);
    const entries = compiled.pattern.entries;
    const ctx: AcStampContext = {
      x: op.x,
      thermalVoltage: op.thermalVoltage,
      addConductance: (h, v) => {
        if (h > 0) g[entries[h].row * n + entries[h].col] += v;
      },
      addReactance: (h, v) => {
        if (h > 0) c[entries[h].row * n + entries[h].col] += v;
      },
    };
    for (const d of compiled.devices) d.stampAc(ctx);
    const view = { x: op.x, thermalVoltage: op.thermalVoltage, temperature: op.temperature };
    const generators = compiled.devices.flatMap((d) => d.noiseSources(view));
    expect(generators.length).toBeGreaterThan(10);
    const out = compiled.netIndex.get(demo.output.plus)!;
    frequencies.forEach((f, i) => {
      const w = 2 * Math.PI * f;
      const rows = [];
      for (let r = 0; r < n; r++) {
        const row = [];
        for (let k = 0; k < n; k++) row.push(complex(g[r * n + k], w * c[r * n + k]));
        rows.push(row);
      }
      const a = matrix(rows);
      const expected = new Map<string, number>();
      for (const gen of generators) {
        const b = Array.from({ length: n }, () => [0]);
        if (gen.plus >= 0) b[gen.plus][0] += 1;
        if (gen.minus >= 0) b[gen.minus][0] -= 1;
        const v = lusolve(a, matrix(b)).toArray() as unknown as { re: number; im: number }[][];
        const vo = v[out][0];
        const power = (vo.re * vo.re + vo.im * vo.im) * gen.psd(f);
        expected.set(gen.part, (expected.get(gen.part) ?? 0) + power);
      }
      for (const [partId, power] of expected) {
        const got = spectrum.partPower.get(partId)![i];
        expect(Math.abs(got - power)).toBeLessThanOrEqual(1e-9 * power + 1e-40);
      }
    });
  });

  describe("amplifier stage: input-referred noise against the noise-figure calculator", () => {
    // Common-source n-JFET, gate at 0 V through the source resistance Rs, drain resistor noiseless. Square law
    // (reference README): at Vgs = 0, Id = Idss and gm = 2·Idss/|Vp| = 4 mS. Channel noise 4kT·(2/3)·gm referred
    // to the gate is e_n² = 4kT·(2/3)/gm; with Rs's own 4kT·Rs the noise factor is the two-generator
    // F = 1 + e_n²/(4kT0·Rs) (Friis 1944), sim/calculators/noise-figure.ts, at T0 = 290 K.
    const T0 = 290;
    const Rs = 1000;
    const stage = (jfet: Record<string, number | string>) =>
      circuit(
        [
          part("VIN", "vsource", { p: "in", n: "0" }, { ac: 1 }),
          part("RS", "resistor", { a: "in", b: "g" }, { resistance: Rs }),
          part("J1", "jfet", { d: "d", g: "g", s: "0" }, { idss: 4e-3, pinch_off: -2, ...jfet }),
          { ...part("RD", "resistor", { a: "vdd", b: "d" }, { resistance: 1000 }), noiseless: true },
          part("VDD", "vsource", { p: "vdd", n: "0" }, { dc: 12 }),
        ],
        { plus: "d" },
        {
          ac: { frequencies: { kind: "list", frequencies: [10, 1000] }, pressure: 1, temperature: T0 },
          noise: noiseAt([10, 1000], T0),
        },
      );

    it("channel thermal noise", () => {
      const r = simulate(stage({}));
      const ein = inputReferredNoise(r.noise!, r.ac!)[1];
      const en = Math.sqrt((4 * K * T0 * (2 / 3)) / 4e-3);
      const expected = noiseFactor({ voltageNoiseDensity: en }, Rs, T0);
      expect((ein * ein) / (4 * K * T0 * Rs) / expected - 1).toBeLessThan(1e-9);
      expect((ein * ein) / (4 * K * T0 * Rs) / expected - 1).toBeGreaterThan(-1e-9);
    });

    it("a given en, with the 1/f corner scaling the PSD by (1 + fc/f)", () => {
      const r = simulate(stage({ en: 5e-9, fc: 100 }));
      const [low, mid] = inputReferredNoise(r.noise!, r.ac!);
      // At 1 kHz the PSD is en²·(1 + 0.1); at 10 Hz en²·(1 + 10) (contract: 1/f corner).
      const expected = noiseFactor({ voltageNoiseDensity: 5e-9 * Math.sqrt(1.1) }, Rs, T0);
      expect((mid * mid) / (4 * K * T0 * Rs) / expected - 1).toBeLessThan(1e-9);
      const channel = r.noise!.contributions.J1;
      expect(channel[0] / channel[1]).toBeCloseTo(Math.sqrt(11 / 1.1), 9);
      expect(low).toBeGreaterThan(mid);
    });
  });
});
