import { describe, expect, it } from "vitest";
import { readQuantity } from "./quantity-input";

describe("calculator inputs read like part values", () => {
  it("takes SI prefixes, units and RKM codes (IEC 60062)", () => {
    expect(readQuantity("25 µm", "length")).toEqual({ ok: true, value: 25e-6 });
    expect(readQuantity("1k2", "resistance")).toEqual({ ok: true, value: 1200 });
    expect(readQuantity("50p", "capacitance")).toEqual({ ok: true, value: 50e-12 });
  });
  it("refuses a wrong unit with the engine's message", () => {
    const r = readQuantity("5 V", "length");
    expect(r.ok).toBe(false);
  });
});
