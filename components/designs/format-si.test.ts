import { describe, expect, it } from "vitest";
import { formatDb, formatSi } from "./format-si";

describe("formatSi", () => {
  it("picks the SI prefix and keeps three significant figures", () => {
    expect(formatSi(0.007919, "V/Pa")).toBe("7.92 mV/Pa");
    expect(formatSi(4700, "Ω")).toBe("4.70 kΩ");
    expect(formatSi(1e9, "Ω")).toBe("1.00 GΩ");
    expect(formatSi(50e-12, "F")).toBe("50.0 pF");
    expect(formatSi(-0.0011, "A")).toBe("-1.10 mA");
    expect(formatSi(999.9, "Hz")).toBe("1.00 kHz");
  });
  it("shows a dash for figures that do not apply", () => {
    expect(formatSi(null, "Hz")).toBe("—");
    expect(formatSi(Number.NaN, "Hz")).toBe("—");
    expect(formatDb(undefined, "dB")).toBe("—");
    expect(formatDb(-42.026, "dBV/Pa")).toBe("-42.0 dBV/Pa");
  });
});
