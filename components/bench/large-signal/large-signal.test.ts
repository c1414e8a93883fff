import { describe, expect, it } from "vitest";
import {
  DEFAULT_DRIVE_FREQUENCY_HZ,
  DEFAULT_POWER_ON_STOP_S,
  driveFrequency,
  powerOnStop,
  sweepLevels,
} from "./drive-defaults";
import { harmonicPercent } from "./harmonic-percent";
import { limitedByWords, maxSplWords } from "./limit-words";

describe("large-signal view helpers", () => {
  it("a harmonic's dB re the fundamental in percent: −40 dB is 1 %, −20 dB is 10 % (20·log10 of an amplitude ratio, common practice)", () => {
    expect(harmonicPercent(-40)).toBeCloseTo(1, 12);
    expect(harmonicPercent(-20)).toBeCloseTo(10, 12);
  });

  it("the drive is the one the file states ('1 kHz' read with the SI prefix), else a 1 kHz sine", () => {
    expect(driveFrequency({ distortion: { frequency: "2 kHz", spl_db: [94] } })).toBe(2000);
    expect(driveFrequency({ transient: { stop: 0.01, drive: { shape: "sine", frequency: 500, spl_db: 94 } } })).toBe(
      500,
    );
    expect(driveFrequency({ distortion: { frequency: "FDRIVE" } })).toBe(DEFAULT_DRIVE_FREQUENCY_HZ);
    expect(driveFrequency(undefined)).toBe(DEFAULT_DRIVE_FREQUENCY_HZ);
  });

  it("the power-on run lasts as long as the file's own power-on transient, else the default", () => {
    expect(powerOnStop({ transient: { from: "power-on", stop: 5 } })).toBe(5);
    expect(powerOnStop({ transient: { stop: 5 } })).toBe(DEFAULT_POWER_ON_STOP_S);
  });

  it("the sweep starts at 94 dB SPL (1 Pa, common practice) in equal steps", () => {
    expect(sweepLevels(94, 106, 6)).toEqual([94, 100, 106]);
  });

  it("max SPL in words names the limiting part and the trade's word for its region", () => {
    const w = maxSplWords({
      max_spl_db: 114.56,
      max_spl_1pct_db: 120.48,
      max_spl_limited_by: { part: "J1", reason: "saturation", detail: "ohmic (triode) region: Vds below Vgs − Vp" },
    });
    expect(w.value).toBe("114.6 dB SPL (0.5 % THD) · 120.5 dB SPL (1 %)");
    expect(w.note).toBe("J1 leaves its region: out of headroom, ohmic (triode) region: Vds below Vgs − Vp");
    expect(maxSplWords({ max_spl_db: 120, max_spl_limited_by: { part: "V1", reason: "grid conduction" } }).note).toBe(
      "V1 leaves its region: grid conduction",
    );
    expect(maxSplWords({ max_spl_db: null }).note).toContain("below 0.5 %");
    expect(limitedByWords(null)).toBeNull();
  });
});
