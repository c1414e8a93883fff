import { describe, expect, it } from "vitest";
import { formatSI } from "./format-si";

// Engineering notation with SI prefixes (BIPM SI Brochure, 9th ed., table 7).
describe("formatSI", () => {
  it("uses the prefix that keeps 1 ≤ mantissa < 1000", () => {
    expect(formatSI(4700, "Ω")).toBe("4.7 kΩ");
    expect(formatSI(50e-12, "F")).toBe("50 pF");
    expect(formatSI(1e9, "Ω")).toBe("1 GΩ");
    expect(formatSI(0.0022, "A")).toBe("2.2 mA");
    expect(formatSI(2.2e-6, "F")).toBe("2.2 µF");
    expect(formatSI(60, "V")).toBe("60 V");
  });
  it("rounds to three significant figures and carries into the next prefix", () => {
    expect(formatSI(999.96, "Ω")).toBe("1 kΩ");
    expect(formatSI(12345, "Hz")).toBe("12.3 kHz");
  });
  it("prints signs, zero and infinity", () => {
    expect(formatSI(-2, "V")).toBe("−2 V");
    expect(formatSI(0, "V")).toBe("0 V");
    expect(formatSI(Number.POSITIVE_INFINITY, "Ω")).toBe("∞ Ω");
    expect(formatSI(0.2)).toBe("200 m");
  });
});
