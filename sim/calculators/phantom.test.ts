import { describe, expect, it } from "vitest";
import {
  PHANTOM_SYSTEMS,
  phantomFit,
  phantomMaxPower,
  phantomShortCircuitCurrent,
  phantomSystem,
  phantomVoltageAtMicrophone,
  phantomWorstCase,
} from "./phantom";

const P48 = PHANTOM_SYSTEMS.P48;

describe("phantom powering (IEC 61938), worked figures from the reference notes", () => {
  it("P48 at 10 mA leaves 14.0 V (48 V − 10 mA · 3.4 kΩ)", () => {
    expect(phantomVoltageAtMicrophone(P48, 10e-3)).toBeCloseTo(14.0, 10);
  });

  it("P48 short-circuit current is 14.1 mA (48 V / 3.4 kΩ)", () => {
    expect(phantomShortCircuitCurrent(P48) * 1e3).toBeCloseTo(14.1, 1);
  });

  it("P48 delivers at most ≈ 169 mW into a matched load (48² / (4 · 3.4 kΩ))", () => {
    expect(phantomMaxPower(P48) * 1e3).toBeCloseTo(169.4, 1);
  });

  it("the matched-load power is the maximum of V·I over all draws (maximum power transfer theorem)", () => {
    let best = 0;
    const isc = phantomShortCircuitCurrent(P48);
    for (let i = 0; i <= 1000; i++) {
      const current = (isc * i) / 1000;
      best = Math.max(best, current * phantomVoltageAtMicrophone(P48, current));
    }
    expect(best / phantomMaxPower(P48)).toBeCloseTo(1, 6);
  });

  it("P12 with 680 Ω per leg at 15 mA leaves 12 − 0.015 · 340 = 6.9 V (hand calculation)", () => {
    expect(phantomVoltageAtMicrophone(PHANTOM_SYSTEMS.P12, 15e-3)).toBeCloseTo(6.9, 10);
  });

  it("marks the entries the reference notes give from memory", () => {
    expect(PHANTOM_SYSTEMS.P24.fromMemory).toEqual(["supplyToleranceV", "maxCurrentA"]);
    expect(PHANTOM_SYSTEMS.P48.fromMemory).toEqual([]);
  });
});

describe("phantom worst cases (supply ± tolerance, feed resistors ± 1 % — common practice for metal-film parts)", () => {
  it("P48 at 10 mA: low corner 44 V − 10 mA · 3434 Ω = 9.66 V; high corner 52 V − 10 mA · 3366 Ω = 18.34 V", () => {
    const w = phantomWorstCase(P48, 10e-3);
    expect(w.minVoltageV).toBeCloseTo(9.66, 10);
    expect(w.maxVoltageV).toBeCloseTo(18.34, 10);
    expect(w.minShortCircuitCurrentA * 1e3).toBeCloseTo(44 / 3.434, 10);
    expect(w.maxShortCircuitCurrentA * 1e3).toBeCloseTo(52 / 3.366, 10);
  });

  it("tighter resistors narrow the spread", () => {
    const loose = phantomWorstCase(P48, 5e-3, 0.05);
    const tight = phantomWorstCase(P48, 5e-3, 0.001);
    expect(tight.minVoltageV).toBeGreaterThan(loose.minVoltageV);
    expect(tight.maxVoltageV).toBeLessThan(loose.maxVoltageV);
  });
});

describe("does a draw fit?", () => {
  it("5 mA needing 12 V fits P48 with 5 mA and 44 − 0.005 · 3434 − 12 = 14.83 V to spare", () => {
    const fit = phantomFit(P48, 5e-3, 12);
    expect(fit.fits).toBe(true);
    expect(fit.verdict).toBe("fits");
    expect(fit.currentMarginA).toBeCloseTo(5e-3, 12);
    expect(fit.voltageMarginV).toBeCloseTo(14.83, 10);
  });

  it("12 mA is over the P48 limit, and the message says by how much", () => {
    const fit = phantomFit(P48, 12e-3);
    expect(fit.fits).toBe(false);
    expect(fit.verdict).toBe("exceeds_current_limit");
    expect(fit.message).toMatch(/reduce the draw by 2\.00 mA/);
  });

  it("8 mA needing 20 V does not fit P48: the worst case leaves 44 − 0.008 · 3434 = 16.53 V", () => {
    const fit = phantomFit(P48, 8e-3, 20);
    expect(fit.verdict).toBe("voltage_too_low");
    expect(fit.worstCaseVoltageV).toBeCloseTo(16.528, 10);
    expect(fit.voltageMarginV).toBeCloseTo(-3.472, 10);
  });

  it("rejects bad inputs with a RangeError", () => {
    expect(() => phantomVoltageAtMicrophone(P48, 20e-3)).toThrow(/short-circuit current is 14\.12 mA/);
    expect(() => phantomVoltageAtMicrophone(P48, -1e-3)).toThrow(RangeError);
    expect(() => phantomWorstCase(P48, 1e-3, 1.5)).toThrow(/relative tolerance/);
    expect(() => phantomSystem("P36")).toThrow(/"P48", "P24" or "P12"/);
  });
});
