import { describe, expect, it } from "vitest";
import { BOLTZMANN_J_PER_K, ELEMENTARY_CHARGE_C } from "../constants";
import { DEFAULT_TEMPERATURE_K } from "../circuit/types";
import { simulate } from "./simulate";
import { circuit, part } from "./test-circuits";

const RELATIVE = 1e-6;
const close = (actual: number | null | undefined | string, expected: number, tol = RELATIVE) => {
  expect(typeof actual).toBe("number");
  expect(Math.abs((actual as number) / expected - 1)).toBeLessThan(tol);
};

/** Bisection on a monotonic scalar function (an independent check of the circuit solve). */
function solveScalar(f: (v: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let i = 0; i < 200; i++) {
    const m = (a + b) / 2;
    if (Math.sign(f(m)) === Math.sign(f(a))) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

describe("JFET", () => {
  const follower = (values: Record<string, number | string>, drainSupply: number) =>
    circuit(
      [
        part("VDD", "vsource", { p: "vdd", n: "0" }, { dc: drainSupply }),
        part("VIN", "vsource", { p: "in", n: "0" }, { dc: 0, ac: 1 }),
        part("RG", "resistor", { a: "in", b: "g" }, { resistance: 1e3 }),
        part("J1", "jfet", { d: "d", g: "g", s: "s" }, values),
        part("RD", "resistor", { a: "vdd", b: "d" }, { resistance: 2e3 }),
        part("RS", "resistor", { a: "s", b: "0" }, { resistance: 1e3 }),
      ],
      { plus: "s" },
    );

  it("self-bias from the Shockley square law: Idss 8 mA, Vp −4 V, Rs 1 kΩ → Id 2 mA, Vgs −2 V, gm 2 mS", () => {
    // Worked example computed from I_D = I_DSS(1 − V_GS/V_P)², V_GS = −I_D·R_S (reference README, amplifier stages).
    const r = simulate(follower({ idss: 8e-3, pinch_off: -4 }, 20));
    const j1 = r.op!.parts.J1;
    expect(j1.region).toBe("saturation");
    close(j1.id, 2e-3);
    close(j1.gm, 2e-3);
    expect(j1.gds).toBe(0);
    close(r.op!.nets.s, 2);
    expect(r.op!.nets.g).toBe(0);
    // Source follower A = gm·R/(1 + gm·R) = 2/3, Z_out = R_S ∥ 1/g_m = 333.3 Ω (reference README).
    close(10 ** (r.figures.gain_1khz_db! / 20), (2e-3 * 1e3) / (1 + 2e-3 * 1e3));
    close(r.figures.output_impedance_1khz_ohm, 1 / (1 / 1e3 + 2e-3));
    expect(r.figures.polarity).toBe("non-inverting");
    expect(r.op!.warnings).toEqual([]);
  });

  it("p-channel mirrors every sign: Idss 4 mA, Vp +2 V, Rs 1 kΩ → Id −1 mA, Vgs +1 V, gm 2 mS", () => {
    // Second worked example of the reference README, mirrored per the contract's p-type rule.
    const r = simulate(follower({ type: "p", idss: 4e-3, pinch_off: 2 }, -20));
    const j1 = r.op!.parts.J1;
    expect(j1.region).toBe("saturation");
    close(j1.id, -1e-3);
    close(j1.gm, 2e-3);
    close(r.op!.nets.s, -1);
  });

  it("lambda raises the current by (1 + λ·Vds) and gives gds = Id0·λ", () => {
    // Contract equation in saturation; the self-bias loop is solved here independently by bisection.
    const lambda = 0.01;
    const r = simulate(follower({ idss: 8e-3, pinch_off: -4, lambda }, 20));
    const id = solveScalar(
      (i) => {
        const vgs = -i * 1e3;
        const vds = 20 - i * 3e3;
        return 8e-3 * (1 - vgs / -4) ** 2 * (1 + lambda * vds) - i;
      },
      0,
      4e-3,
    );
    close(r.op!.parts.J1.id, id, 1e-8);
    const vov = -id * 1e3 + 4;
    close(r.op!.parts.J1.gds, 8e-3 * (vov / 4) ** 2 * lambda, 1e-6);
  });

  it("linear region and cut-off are reported; a forward-biased gate warns", () => {
    // Vds small (drain tied through 1 Ω to 0.1 V) with Vgs = 0: linear region (Vds < Vov = 4 V), contract.
    const linear = simulate(
      circuit(
        [
          part("VD", "vsource", { p: "d", n: "0" }, { dc: 0.1 }),
          part("J1", "jfet", { d: "d", g: "0", s: "0" }, { idss: 8e-3, pinch_off: -4 }),
        ],
        { plus: "d" },
      ),
    );
    expect(linear.op!.parts.J1.region).toBe("linear");
    // Id = idss·(2·Vov·Vds − Vds²)/Vp² (contract).
    close(linear.op!.parts.J1.id, (8e-3 * (2 * 4 * 0.1 - 0.01)) / 16, 1e-9);
    const cut = simulate(
      circuit(
        [
          part("VD", "vsource", { p: "d", n: "0" }, { dc: 5 }),
          part("VG", "vsource", { p: "g", n: "0" }, { dc: -5 }),
          part("J1", "jfet", { d: "d", g: "g", s: "0" }, { idss: 8e-3, pinch_off: -4 }),
        ],
        { plus: "d" },
      ),
    );
    expect(cut.op!.parts.J1.region).toBe("cut-off");
    expect(cut.op!.parts.J1.id).toBe(0);
    const forward = simulate(
      circuit(
        [
          part("VD", "vsource", { p: "d", n: "0" }, { dc: 5 }),
          part("VG", "vsource", { p: "g", n: "0" }, { dc: 0.8 }),
          part("J1", "jfet", { d: "d", g: "g", s: "0" }, { idss: 8e-3, pinch_off: -4 }),
        ],
        { plus: "d" },
      ),
    );
    expect(forward.op!.warnings.map((w) => w.part)).toEqual(["J1"]);
  });

  it("negative Vds swaps drain and source", () => {
    // Contract: for Vds < 0 drain and source swap roles; with the gate at the lower terminal (the "source" after
    // the swap is the drain pin at −0.1 V), Id = −idss·(2·Vov·0.1 − 0.01)/Vp² with Vov = Vgd − Vp.
    const r = simulate(
      circuit(
        [
          part("VD", "vsource", { p: "d", n: "0" }, { dc: -0.1 }),
          part("J1", "jfet", { d: "d", g: "d", s: "0" }, { idss: 8e-3, pinch_off: -4 }),
        ],
        { plus: "d" },
      ),
    );
    close(r.op!.parts.J1.id, (-8e-3 * (2 * 4 * 0.1 - 0.01)) / 16, 1e-9);
  });
});

describe("triode", () => {
  const mu = 100;
  const k = 1.5e-6;
  it("common cathode (bypassed): gain μ·RL/(rp + RL) with μ = gm·rp from the three-halves law", () => {
    // I_a = G·(V_a + μ·V_g)^(3/2); A = μ·R_L/(r_p + R_L) (reference README, amplifier stages).
    const RL = 100e3;
    const r = simulate(
      circuit(
        [
          part("VB", "vsource", { p: "bplus", n: "0" }, { dc: 250 }),
          part("VG", "vsource", { p: "g", n: "0" }, { dc: -1.5, ac: 1 }),
          part("RL", "resistor", { a: "bplus", b: "a" }, { resistance: RL }),
          part("V1", "triode", { a: "a", g: "g", k: "0" }, { mu, k }),
        ],
        { plus: "a" },
      ),
    );
    const ia = solveScalar((i) => k * Math.max(0, 250 - i * RL + mu * -1.5) ** 1.5 - i, 0, 250 / RL);
    const v1 = r.op!.parts.V1;
    expect(v1.region).toBe("conducting");
    close(v1.ia, ia, 1e-8);
    const rp = 1 / (1.5 * k * Math.sqrt(250 - ia * RL - 150));
    close(v1.rp, rp, 1e-6);
    close((v1.gm as number) * (v1.rp as number), mu, 1e-12);
    close(10 ** (r.figures.gain_1khz_db! / 20), (mu * RL) / (rp + RL));
    expect(r.figures.polarity).toBe("inverting");
  });

  it("cathode follower: gain μ·Rk/(rp + (μ+1)·Rk), output impedance (rp/(μ+1)) ∥ Rk", () => {
    // Reference README, amplifier stages.
    const Rk = 10e3;
    const r = simulate(
      circuit(
        [
          part("VB", "vsource", { p: "bplus", n: "0" }, { dc: 250 }),
          part("VG", "vsource", { p: "g", n: "0" }, { dc: 100, ac: 1 }),
          part("V1", "triode", { a: "bplus", g: "g", k: "k" }, { mu, k }),
          part("RK", "resistor", { a: "k", b: "0" }, { resistance: Rk }),
        ],
        { plus: "k" },
      ),
    );
    const ia = solveScalar((i) => k * Math.max(0, 250 - i * Rk + mu * (100 - i * Rk)) ** 1.5 - i, 0, 350 / Rk);
    close(r.op!.parts.V1.ia, ia, 1e-8);
    const rp = r.op!.parts.V1.rp as number;
    close(10 ** (r.figures.gain_1khz_db! / 20), (mu * Rk) / (rp + (mu + 1) * Rk));
    close(r.figures.output_impedance_1khz_ohm, 1 / ((mu + 1) / rp + 1 / Rk));
  });

  it("a grid far below cut-off warns that the valve is cut off", () => {
    const r = simulate(
      circuit(
        [
          part("VB", "vsource", { p: "bplus", n: "0" }, { dc: 100 }),
          part("VG", "vsource", { p: "g", n: "0" }, { dc: -5 }),
          part("RL", "resistor", { a: "bplus", b: "a" }, { resistance: 1e5 }),
          part("V1", "triode", { a: "a", g: "g", k: "0" }, { mu, k }),
        ],
        { plus: "a" },
      ),
    );
    expect(r.op!.parts.V1.region).toBe("cut-off");
    expect(r.op!.warnings.map((w) => w.part)).toEqual(["V1"]);
  });
});

describe("BJT", () => {
  const vt = (BOLTZMANN_J_PER_K * DEFAULT_TEMPERATURE_K) / ELEMENTARY_CHARGE_C;
  const beta = 100;
  const is = 1e-14;
  const follower = (type: "npn" | "pnp") => {
    const s = type === "npn" ? 1 : -1;
    return circuit(
      [
        part("VC", "vsource", { p: "vcc", n: "0" }, { dc: 15 * s }),
        part("VB", "vsource", { p: "in", n: "0" }, { dc: 5 * s, ac: 1 }),
        part("RB", "resistor", { a: "in", b: "b" }, { resistance: 1e3 }),
        part("Q1", "bjt", { c: "vcc", b: "b", e: "e" }, { type, beta, is }),
        part("RE", "resistor", { a: "e", b: "0" }, { resistance: 4.3e3 }),
      ],
      { plus: "e" },
    );
  };

  it("emitter follower: Ebers–Moll bias, Z_out ≈ r_e + R_s/(β + 1) in parallel with R_E", () => {
    // Bias solved independently: Ie = Is·e^(Vbe/Vt)·(1 + 1/β) (Vbc ≪ 0), Vb = 5 − Ib·Rs, Ve = Ie·Re.
    const r = simulate(follower("npn"));
    const q = r.op!.parts.Q1;
    expect(q.region).toBe("active");
    const ic = solveScalar(
      (i) => {
        const vbe = vt * Math.log(i / is + 1);
        return 5 - (i / beta) * 1e3 - vbe - i * (1 + 1 / beta) * 4.3e3;
      },
      1e-6,
      2e-3,
    );
    close(q.ic, ic, 1e-6);
    close(q.ib, ic / beta, 1e-6);
    close(q.gm, (ic + is) / vt, 1e-6);
    close(q.rpi, (beta * vt) / (ic + is), 1e-6);
    // No Early voltage: only the reverse-biased collector junction's leakage conductance is left.
    expect(q.ro as number).toBeGreaterThan(1e15);
    // r_e = V_T/I_C; Z_out ≈ r_e + R_s/(β + 1) (reference README, emitter follower; an approximation: 2 %).
    const zApprox = vt / ic + 1e3 / (beta + 1);
    const expected = 1 / (1 / zApprox + 1 / 4.3e3);
    close(r.figures.output_impedance_1khz_ohm, expected, 0.02);
    // Hybrid-π exactly (gm·rpi = β): Z_e = (Rs + rpi)/(β + 1) ∥ R_E (any electronics text, from memory).
    const exact = 1 / ((beta + 1) / (1e3 + (q.rpi as number)) + 1 / 4.3e3);
    close(r.figures.output_impedance_1khz_ohm, exact, 1e-6);
  });

  it("pnp mirrors the npn signs", () => {
    // Contract: pnp negates every terminal voltage and current of the npn equations.
    const n = simulate(follower("npn")).op!;
    const p = simulate(follower("pnp")).op!;
    close(p.parts.Q1.ic, -(n.parts.Q1.ic as number), 1e-9);
    close(p.nets.e, -n.nets.e, 1e-9);
    close(p.parts.Q1.gm, n.parts.Q1.gm as number, 1e-9);
  });

  it("Early voltage scales the forward transport only: ro = (vaf + Vce)/Ic at fixed Vbe", () => {
    // Contract: Ic = IF·(1 + Vce/vaf) − …; ∂Ic/∂Vce = IF/vaf, so ro = vaf/IF = (vaf + Vce)/Ic in the active region.
    const vaf = 50;
    const r = simulate(
      circuit(
        [
          part("VC", "vsource", { p: "c", n: "0" }, { dc: 5 }),
          part("VB", "vsource", { p: "b", n: "0" }, { dc: 0.6 }),
          part("Q1", "bjt", { c: "c", b: "b", e: "0" }, { vaf, is }),
        ],
        { plus: "c" },
      ),
    );
    const iF = is * (Math.exp(0.6 / vt) - 1);
    close(r.op!.parts.Q1.ic, iF * (1 + 5 / vaf) - is * (Math.exp(-4.4 / vt) - 1) * 2, 1e-9);
    close(r.op!.parts.Q1.ib, iF / beta + is * (Math.exp(-4.4 / vt) - 1), 1e-9);
    close(r.op!.parts.Q1.ro, vaf / iF, 1e-6);
  });

  it("a hard-driven switch saturates and warns", () => {
    const r = simulate(
      circuit(
        [
          part("VC", "vsource", { p: "vcc", n: "0" }, { dc: 5 }),
          part("VB", "vsource", { p: "in", n: "0" }, { dc: 5 }),
          part("RB", "resistor", { a: "in", b: "b" }, { resistance: 1e3 }),
          part("RC", "resistor", { a: "vcc", b: "c" }, { resistance: 1e3 }),
          part("Q1", "bjt", { c: "c", b: "b", e: "0" }),
        ],
        { plus: "c" },
      ),
    );
    expect(r.op!.parts.Q1.region).toBe("saturation");
    expect(r.op!.nets.c).toBeLessThan(0.2);
    expect(r.op!.warnings.map((w) => w.part)).toEqual(["Q1"]);
  });
});
