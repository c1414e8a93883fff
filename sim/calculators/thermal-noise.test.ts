import { describe, expect, it } from "vitest";
import { thermalNoiseDensity, thermalNoiseRms } from "./thermal-noise";

describe("Johnson–Nyquist thermal noise √(4kTR)", () => {
  it("1 kΩ at 300 K is 4.07 nV/√Hz (standard result)", () => {
    expect(thermalNoiseDensity(1000, 300) * 1e9).toBeCloseTo(4.07, 2);
  });

  it("scales as √R and √B: 100 kΩ over 10 kHz at 300 K is 4.07 nV · 10 · 100 = 4.07 µV", () => {
    expect(thermalNoiseRms(100e3, 10e3, 300) * 1e6).toBeCloseTo(4.07, 2);
  });

  it("defaults to the contract's 298.15 K", () => {
    expect(thermalNoiseDensity(1000)).toBeCloseTo(Math.sqrt(4 * 1.380649e-23 * 298.15 * 1000), 20);
  });

  it("rejects a non-positive resistance, temperature or bandwidth", () => {
    expect(() => thermalNoiseDensity(0)).toThrow(/Resistance must be/);
    expect(() => thermalNoiseDensity(1000, -1)).toThrow(/Temperature must be/);
    expect(() => thermalNoiseRms(1000, 0)).toThrow(/Bandwidth must be/);
  });
});
