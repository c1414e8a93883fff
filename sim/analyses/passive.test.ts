import { describe, expect, it } from "vitest";
import { simulate } from "./simulate";
import { acGrid, circuit, part } from "./test-circuits";

describe("passive circuits", () => {
  it("voltage divider: Vout = V·R2/(R1 + R2), source current V/(R1 + R2)", () => {
    // Ohm's law and Kirchhoff's laws (any circuits text).
    const c = circuit(
      [
        part("V1", "vsource", { p: "in", n: "0" }, { dc: 10, ac: 1 }),
        part("R1", "resistor", { a: "in", b: "out" }, { resistance: 3000 }),
        part("R2", "resistor", { a: "out", b: "0" }, { resistance: 1000 }),
      ],
      { plus: "out" },
    );
    const r = simulate(c);
    expect(r.op!.nets.out).toBeCloseTo(2.5, 12);
    expect(r.op!.parts.V1.current).toBeCloseTo(10 / 4000, 15);
    expect(r.figures.gain_1khz_db).toBeCloseTo(20 * Math.log10(0.25), 10);
    // Thevenin resistance R1 ∥ R2 = 750 Ω.
    expect(r.figures.output_impedance_1khz_ohm).toBeCloseTo(750, 8);
    expect(r.figures.polarity).toBe("non-inverting");
  });

  it("first-order RC high-pass: corner 1/(2πRC), 1 GΩ with 50 pF ≈ 3.18 Hz, found to 0.1 %", () => {
    // Time constant 1 GΩ × 50 pF = 50 ms, corner 1/(2πRC) ≈ 3.2 Hz (common practice; reference README).
    const R = 1e9;
    const C = 50e-12;
    const c = circuit(
      [
        part("V1", "vsource", { p: "in", n: "0" }, { ac: 1 }),
        part("C1", "capacitor", { a: "in", b: "out" }, { capacitance: C }),
        part("R1", "resistor", { a: "out", b: "0" }, { resistance: R }),
      ],
      { plus: "out" },
      { ac: acGrid(1, 1e5, 10) },
    );
    const r = simulate(c);
    const exact = 1 / (2 * Math.PI * R * C);
    expect(exact).toBeCloseTo(3.18, 2);
    // The reference is |H(1 kHz)| (not 1): solve |H(f)| = |H(1k)|/√2 exactly for the first-order high-pass.
    const h1k = 1 / Math.sqrt(1 + (exact / 1000) ** 2);
    const f = exact / Math.sqrt(2 / (h1k * h1k) - 1);
    expect(Math.abs(r.figures.low_corner_hz! / f - 1)).toBeLessThan(1e-3);
    expect(r.figures.high_corner_hz).toBeNull();
    // Response on the grid: |H| = f/√(f² + fc²), phase +atan(fc/f) (first-order high-pass, any filters text).
    r.ac!.frequency.forEach((fr, i) => {
      const expected = fr / Math.hypot(fr, exact);
      expect(10 ** (r.ac!.magnitude_db[i] / 20)).toBeCloseTo(expected, 9);
      expect(r.ac!.phase_deg[i]).toBeCloseTo((Math.atan(exact / fr) * 180) / Math.PI, 7);
    });
    expect(r.ac!.frequency.length).toBe(51);
    expect(r.ac!.frequency[0]).toBe(1);
    expect(r.ac!.frequency[50]).toBe(1e5);
  });

  it("RC low-pass: high corner 1/(2πRC) to 0.1 %, inductor-R low-pass corner R/(2πL)", () => {
    // First-order low-pass corners (any filters text): RC: 1/(2πRC); RL: R/(2πL).
    const rc = simulate(
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { ac: 1 }),
          part("R1", "resistor", { a: "in", b: "out" }, { resistance: 1000 }),
          part("C1", "capacitor", { a: "out", b: "0" }, { capacitance: 1e-9 }),
        ],
        { plus: "out" },
      ),
    );
    const fc = 1 / (2 * Math.PI * 1000 * 1e-9);
    const h1k = 1 / Math.sqrt(1 + (1000 / fc) ** 2);
    const expected = fc * Math.sqrt(2 / (h1k * h1k) - 1);
    expect(Math.abs(rc.figures.high_corner_hz! / expected - 1)).toBeLessThan(1e-3);

    const rl = simulate(
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { ac: 1 }),
          part("L1", "inductor", { a: "in", b: "out" }, { inductance: 10e-3 }),
          part("R1", "resistor", { a: "out", b: "0" }, { resistance: 1000 }),
        ],
        { plus: "out" },
      ),
    );
    const fl = 1000 / (2 * Math.PI * 10e-3);
    const h = 1 / Math.sqrt(1 + (1000 / fl) ** 2);
    expect(Math.abs(rl.figures.high_corner_hz! / (fl * Math.sqrt(2 / (h * h) - 1)) - 1)).toBeLessThan(1e-3);
    // DC: the inductor is a short, so out = in's DC (0 here) and the branch current is reported.
    expect(rl.op!.parts.L1.current).toBe(0);
  });

  it("cable capacitance loads a high source impedance: corner 1/(2π·Rs·C·length)", () => {
    // Microphone cable about 100 pF/m (common practice, reference README); 10 m with a 100 kΩ source forms a
    // first-order low-pass with C = 1 nF: fc = 1/(2π·1e5·1e-9) ≈ 1.59 kHz (RC low-pass, any filters text).
    const make = (resistancePerM: number) =>
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { ac: 1 }),
          part("RS", "resistor", { a: "in", b: "send" }, { resistance: 1e5 }),
          part("W1", "cable", { a: "send", b: "out", ref: "0" }, { length: 10, resistance_per_m: resistancePerM }),
        ],
        { plus: "out" },
      );
    const ideal = simulate(make(0));
    const fc = 1 / (2 * Math.PI * 1e5 * 1e-9);
    const h = 1 / Math.sqrt(1 + (1000 / fc) ** 2);
    expect(Math.abs(ideal.figures.high_corner_hz! / (fc * Math.sqrt(2 / (h * h) - 1)) - 1)).toBeLessThan(1e-3);
    expect(10 ** (ideal.figures.gain_1khz_db! / 20)).toBeCloseTo(h, 9);
    // 0.05 Ω/m adds 0.5 Ω to 100 kΩ: the figure moves by about 5 ppm, not more.
    const lossy = simulate(make(0.05));
    expect(Math.abs(lossy.figures.high_corner_hz! / ideal.figures.high_corner_hz! - 1)).toBeLessThan(1e-3);
  });

  it("load R ∥ C and a current source: V = I·R at DC", () => {
    // Ohm's law. Contract sign: 1 mA from p = "0" to n = "x" pushes 1 mA into x.
    const r = simulate(
      circuit(
        [
          part("I1", "isource", { p: "0", n: "x" }, { dc: 1e-3 }),
          part("LD", "load", { p: "x", n: "0" }, { resistance: 2000, capacitance: 1e-9 }),
        ],
        { plus: "x" },
      ),
    );
    expect(r.op!.nets.x).toBeCloseTo(2, 12);
  });

  it("vcvs and vccs: ideal gain blocks", () => {
    // Definitions of the contract: V(p) − V(n) = gain·V(c); gm·V(c) taken from p, delivered into n.
    const r = simulate(
      circuit(
        [
          part("V1", "vsource", { p: "in", n: "0" }, { dc: 0.5, ac: 1 }),
          part("R0", "resistor", { a: "in", b: "0" }, { resistance: 1e3 }),
          part("E1", "vcvs", { p: "mid", n: "0", cp: "in", cn: "0" }, { gain: 4 }),
          part("G1", "vccs", { p: "out", n: "0", cp: "mid", cn: "0" }, { transconductance: 1e-3 }),
          part("RL", "resistor", { a: "out", b: "0" }, { resistance: 2e3 }),
        ],
        { plus: "out" },
      ),
    );
    // out = −gm·RL·4·in: the current is taken from "out".
    expect(r.op!.nets.mid).toBeCloseTo(2, 12);
    expect(r.op!.nets.out).toBeCloseTo(-4, 12);
    expect(r.figures.polarity).toBe("inverting");
    expect(r.figures.gain_1khz_db).toBeCloseTo(20 * Math.log10(8), 10);
  });

  it("a floating net is reported as singular_circuit naming the net", () => {
    const c = circuit(
      [
        part("V1", "vsource", { p: "in", n: "0" }, { dc: 1 }),
        part("R1", "resistor", { a: "in", b: "0" }, { resistance: 1e3 }),
        part("C1", "capacitor", { a: "in", b: "float" }, { capacitance: 1e-9 }),
        part("C2", "capacitor", { a: "float", b: "0" }, { capacitance: 1e-9 }),
      ],
      { plus: "in" },
    );
    expect(() => simulate(c)).toThrowError(expect.objectContaining({ code: "singular_circuit", net: "float" }));
  });
});
