import { describe, expect, it } from "vitest";
import { DEFAULT_TEMPERATURE_K, type ElaboratedPart } from "../circuit/types";
import { simulate } from "./simulate";
import { circuit, part } from "./test-circuits";

const T = DEFAULT_TEMPERATURE_K;

describe("distortion", () => {
  it("a square-law common-source stage gives H2/H1 = a/(4·Vov) and nothing above", () => {
    // Square law Id = K·(Vov + a·sin ωt)² = K·(Vov² + a²/2) + 2K·Vov·a·sin ωt − (K·a²/2)·cos 2ωt, so
    // H2/H1 = a/(4·Vov) exactly (Shockley's equation, reference README); no third or higher harmonic.
    // Idss 8 mA, pinch-off −4 V, Vgs −2 V → Vov = 2 V, Id = 2 mA, Vds = 18 V (saturation throughout).
    const a = 0.05;
    const vov = 2;
    const c = circuit(
      [
        part("VDD", "vsource", { p: "vdd", n: "0" }, { dc: 20 }),
        { ...part("VIN", "vsource", { p: "g", n: "0" }, { dc: -2, ac: 1 }), role: "input" } as ElaboratedPart,
        part("RD", "resistor", { a: "vdd", b: "d" }, { resistance: 1e3 }),
        part("J1", "jfet", { d: "d", g: "g", s: "0" }, { idss: 8e-3, pinch_off: -4 }),
      ],
      { plus: "d" },
      { distortion: { frequency: 1000, levels: [a], temperature: T } },
    );
    const [point] = simulate(c).distortion!;
    const expected = a / (4 * vov);
    const H2_TOLERANCE = 1e-3; // relative, of the ratio
    expect(Math.abs(10 ** (point.harmonics_db[0] / 20) / expected - 1)).toBeLessThan(H2_TOLERANCE);
    for (const h of point.harmonics_db.slice(1)) expect(h).toBeLessThan(-100);
    // fundamental: 2·K·Vov·a·RD with K = Idss/Vp² (peak volts)
    expect(point.fundamental / (2 * (8e-3 / 16) * vov * a * 1e3)).toBeCloseTo(1, 3);
    expect(point.thd_percent).toBeCloseTo(100 * expected, 2);
  });

  it("a symmetric limiter of two diode-connected transistors gives odd harmonics only", () => {
    // An odd transfer curve i(−v) = −i(v) produces only odd harmonics of a sine (half-wave symmetry, Fourier series).
    const c = circuit(
      [
        { ...part("VIN", "vsource", { p: "in", n: "0" }, { dc: 0, ac: 1 }), role: "input" } as ElaboratedPart,
        part("R1", "resistor", { a: "in", b: "out" }, { resistance: 1e3 }),
        part("Q1", "bjt", { c: "out", b: "out", e: "0" }),
        part("Q2", "bjt", { c: "0", b: "0", e: "out" }),
      ],
      { plus: "out" },
      { distortion: { frequency: 1000, levels: [3], temperature: T } },
    );
    const [point] = simulate(c).distortion!;
    const [h2, h3, h4, h5, h6] = point.harmonics_db;
    for (const even of [h2, h4, h6]) expect(even).toBeLessThan(-80);
    expect(h3).toBeGreaterThan(-30);
    expect(h5).toBeGreaterThan(-50);
    expect(point.thd_percent).toBeGreaterThan(5);
  });

  it("max_spl_db is where THD crosses 0.5 %, 1 % above it, and names the device and reason", () => {
    // IEC 60268-4 style maximum SPL (reference README): the THD at max_spl_db is 0.5 % and grows with level.
    const c = circuit(
      [
        part("VPOL", "vsource", { p: "pol", n: "0" }, { dc: 60 }),
        part("RB", "resistor", { a: "pol", b: "dia" }, { resistance: 1e9 }),
        part("MIC", "capsule", { diaphragm: "dia", backplate: "0" }, { capacitance: 50e-12, strain_per_pa: 3e-4 }),
        part("C1", "capacitor", { a: "dia", b: "g" }, { capacitance: 1e-9 }),
        part("RG", "resistor", { a: "g", b: "0" }, { resistance: 1e9 }),
        part("VDD", "vsource", { p: "vdd", n: "0" }, { dc: 12 }),
        part("J1", "jfet", { d: "vdd", g: "g", s: "s" }, { idss: 4e-3, pinch_off: -2 }),
        part("RS", "resistor", { a: "s", b: "0" }, { resistance: 4.7e3 }),
      ],
      { plus: "s" },
      { distortion: { frequency: 1000, splDb: [100], temperature: T } },
    );
    const r = simulate(c);
    const max = r.figures.max_spl_db as number;
    const onePercent = r.figures.max_spl_1pct_db as number;
    expect(max).toBeGreaterThan(40);
    expect(onePercent).toBeGreaterThan(max);
    expect(r.figures.max_spl_limited_by).toEqual({ part: "J1", reason: "cut-off" });
    const check = simulate({
      ...c,
      analyses: { distortion: { frequency: 1000, splDb: [max - 0.2, max + 0.2], temperature: T } },
    });
    expect(check.distortion![0].thd_percent).toBeLessThan(0.5);
    expect(check.distortion![1].thd_percent).toBeGreaterThan(0.5);
  });

  it("a common-source JFET short of drain headroom is limited by the contract's saturation, detailed as the ohmic (triode) region", () => {
    // Self-bias by hand (Shockley's equation, reference README): Id = 1 mA·(2 − 470·Id)² gives Id ≈ 1.58 mA,
    // Vov ≈ 1.26 V; with RD 5.2 kΩ, Vds ≈ 12 − 1.58 mA·5.67 kΩ ≈ 3.0 V, only ≈ 1.7 V above Vov = Vgs − Vp, while
    // cut-off is ≈ 1.26 V·(1 + gm·RS) ≈ 2.8 V of gate swing away: the drain swing (gain ≈ 6) reaches Vds = Vov
    // first. The contract names that "saturation" (out of headroom); in the JFET trade it is the ohmic (triode)
    // region, because a JFET's own "saturation" is where it normally works — hence the detail.
    const c = circuit(
      [
        part("VPOL", "vsource", { p: "pol", n: "0" }, { dc: 60 }),
        part("RB", "resistor", { a: "pol", b: "dia" }, { resistance: 1e9 }),
        part("MIC", "capsule", { diaphragm: "dia", backplate: "0" }, { capacitance: 50e-12, strain_per_pa: 3e-4 }),
        part("C1", "capacitor", { a: "dia", b: "g" }, { capacitance: 1e-9 }),
        part("RG", "resistor", { a: "g", b: "0" }, { resistance: 1e9 }),
        part("VDD", "vsource", { p: "vdd", n: "0" }, { dc: 12 }),
        part("RD", "resistor", { a: "vdd", b: "d" }, { resistance: 5.2e3 }),
        part("J1", "jfet", { d: "d", g: "g", s: "s" }, { idss: 4e-3, pinch_off: -2 }),
        part("RS", "resistor", { a: "s", b: "0" }, { resistance: 470 }),
      ],
      { plus: "d" },
      { distortion: { frequency: 1000, splDb: [94], temperature: T } },
    );
    const r = simulate(c);
    expect(r.figures.max_spl_db).not.toBeNull();
    expect(r.figures.max_spl_limited_by).toEqual({
      part: "J1",
      reason: "saturation",
      detail: "ohmic (triode) region: Vds below Vgs − Vp",
    });
  });
});
