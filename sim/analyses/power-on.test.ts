import { describe, expect, it } from "vitest";
import { DEFAULT_TEMPERATURE_K } from "../circuit/types";
import { settleTime } from "./power-on";
import { simulate } from "./simulate";
import { circuit, part } from "./test-circuits";

describe("power-on settling", () => {
  it("an RC bias network settles to 1 % in RC·ln(100)", () => {
    // v(t) = V·(1 − e^(−t/RC)) is within 1 % of V once e^(−t/RC) ≤ 0.01, at t = RC·ln(100) (closed form;
    // 1 GΩ × 50 pF = 50 ms, reference README) = 0.2303 s.
    const rc = 1e9 * 50e-12;
    const c = circuit(
      [
        part("VPOL", "vsource", { p: "pol", n: "0" }, { dc: 60 }),
        part("RB", "resistor", { a: "pol", b: "dia" }, { resistance: 1e9 }),
        part("MIC", "capsule", { diaphragm: "dia", backplate: "0" }, { capacitance: 50e-12, strain_per_pa: 1e-4 }),
      ],
      { plus: "dia" },
      {
        transient: { stop: 0.4, step: 1e-3, from: "power-on", probe: ["dia"], temperature: DEFAULT_TEMPERATURE_K },
      },
    );
    const r = simulate(c);
    const SETTLE_TOLERANCE = 0.01; // relative
    expect(Math.abs((r.figures.settle_time_s as number) / (rc * Math.log(100)) - 1)).toBeLessThan(SETTLE_TOLERANCE);
    expect(r.transient!.time[0]).toBe(0);
    expect(r.transient!.nets.dia[0]).toBe(0);
    expect(r.transient!.polarisation!.MIC.at(-1)).toBeCloseTo(60 * (1 - Math.exp(-0.4 / rc)), 2);
    expect(r.transient!.time.at(-1)).toBe(0.4);
  });

  it("settle time is the last exit from the 1 % band, null when still outside", () => {
    // Definition in the contract: within 1 % of the final value from then on.
    expect(settleTime([0, 1, 2, 3], [[0, 99.5, 101.5, 100.2]], [100])).toBeCloseTo(2 + 0.5 / 1.3, 12);
    expect(settleTime([0, 1], [[0, 90]], [100])).toBeNull();
  });
});
