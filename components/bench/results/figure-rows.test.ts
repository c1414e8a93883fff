import { describe, expect, it } from "vitest";
import { parseSweepValues } from "../overlays/overlay-controls";
import { pinCurve } from "../overlays/pinned";
import { figureRows } from "./figures-panel";
import { formatSi } from "./format";

describe("figure rows", () => {
  it("shows sensitivity in mV/Pa and dB re 1 V/Pa (IEC 60268-4 levels: 20·log10(0.0119) = −38.5 dB)", () => {
    const rows = figureRows(
      { sensitivity_v_per_pa: 0.011879, sensitivity_db_re_1v_per_pa: -38.504, self_noise_dba_spl: 14.23 },
      true,
      true,
    );
    expect(rows[0].value).toBe("11.88 mV/Pa · −38.5 dB re 1 V/Pa");
    expect(rows.find((r) => r.key === "self-noise")?.value).toBe("14.2 dB(A) SPL");
  });

  it("says why a null figure is missing", () => {
    const rows = figureRows(
      { sensitivity_v_per_pa: null, self_noise_dba_spl: null, low_corner_hz: null },
      false,
      false,
    );
    expect(rows[0]).toMatchObject({ value: "—", reason: "no capsule is driven in this circuit" });
    expect(rows.find((r) => r.key === "self-noise")?.reason).toMatch(/noise analysis/);
    expect(rows.find((r) => r.key === "low")?.reason).toMatch(/0.1 Hz/);
  });

  it("formats SI values with prefixes", () => {
    expect(formatSi(302.9, "Ω")).toBe("303 Ω");
    expect(formatSi(14434.8, "Hz")).toBe("14.4 kHz");
    expect(formatSi(1.2e-9, "F")).toBe("1.2 nF");
    expect(formatSi(null, "Hz")).toBe("—");
  });
});

describe("overlay inputs", () => {
  it("a sweep needs two or more values that read as numbers", () => {
    expect(parseSweepValues("2k2, 4k7 10k")).toEqual({ values: ["2k2", "4k7", "10k"] });
    expect(parseSweepValues("4k7")).toHaveProperty("problem");
    expect(parseSweepValues("4k7, banana")).toHaveProperty("problem");
  });

  it("a pinned result keeps a dashed copy of the curve under its own id", () => {
    const curve = {
      id: "live",
      label: "Design",
      frequency: [1],
      magnitude_db: [0],
      phase_deg: [0],
      style: "live" as const,
    };
    const pinned = pinCurve(curve, { gain_1khz_db: -3 }, new Date(Date.UTC(2026, 0, 1, 12, 0, 0)));
    expect(pinned.curve.style).toBe("pinned");
    expect(pinned.curve.id).not.toBe("live");
    expect(pinned.figures.gain_1khz_db).toBe(-3);
  });
});
