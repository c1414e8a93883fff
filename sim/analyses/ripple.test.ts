import { describe, expect, it } from "vitest";
import { DEFAULT_TEMPERATURE_K, type ElaboratedPart } from "../circuit/types";
import { simulate } from "./simulate";
import { acGrid, circuit, part } from "./test-circuits";

describe("supply ripple", () => {
  it("an RC supply filter rejects ripple by 20·log10(1/√(1 + (ωRC)²))", () => {
    // First-order low-pass closed form (any circuits text), R = 1 kΩ, C = 10 µF, RC = 10 ms.
    const r = 1e3;
    const cap = 10e-6;
    const c = circuit(
      [
        { ...part("VS", "vsource", { p: "raw", n: "0" }, { dc: 48, ac: 0.5 }), role: "supply" } as ElaboratedPart,
        { ...part("VIN", "vsource", { p: "in", n: "0" }, { dc: 0, ac: 1 }), role: "input" } as ElaboratedPart,
        part("RF", "resistor", { a: "raw", b: "out" }, { resistance: r }),
        part("CF", "capacitor", { a: "out", b: "0" }, { capacitance: cap }),
        part("RIN", "resistor", { a: "in", b: "out" }, { resistance: 1e9 }),
      ],
      { plus: "out" },
      {
        ac: acGrid(10, 1000, 2),
        ripple: { frequencies: { kind: "list", frequencies: [50, 100, 1000] }, temperature: DEFAULT_TEMPERATURE_K },
      },
    );
    const result = simulate(c);
    // the 1 GΩ from the input source is part of the filter's load: R ∥ 1 GΩ in the divider
    const expected = (f: number) => {
      const w = 2 * Math.PI * f;
      const g = 1 / r + 1 / 1e9;
      return 20 * Math.log10(1 / r / Math.hypot(g, w * cap));
    };
    const DB_TOLERANCE = 1e-6;
    result.ripple!.frequency.forEach((f, i) => {
      expect(Math.abs(result.ripple!.rejection_db[i] - expected(f))).toBeLessThan(DB_TOLERANCE);
    });
    expect(Math.abs((result.figures.supply_rejection_1khz_db as number) - expected(1000))).toBeLessThan(DB_TOLERANCE);
  });

  it("asks for a supply-role source when there is none", () => {
    const c = circuit(
      [
        part("V1", "vsource", { p: "a", n: "0" }, { dc: 1, ac: 1 }),
        part("R1", "resistor", { a: "a", b: "0" }, { resistance: 1 }),
      ],
      { plus: "a" },
      { ripple: { frequencies: { kind: "list", frequencies: [1000] }, temperature: DEFAULT_TEMPERATURE_K } },
    );
    expect(() => simulate(c)).toThrow(/role": "supply"/);
  });
});
