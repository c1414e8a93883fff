import { describe, expect, it } from "vitest";
import { noiseTraces } from "../plots/traces";
import { compareChosen, dbvToDensity, overlayOf } from "./measurement-overlay";

/**
 * A white noise floor of 10 nV/√Hz simulated, and "measured" 3 dB higher: 3 dB in power is a factor √2 in density
 * (20·log10 √2 = 3.0103 dB; dB definitions, common practice), so the overlay drawn in V/√Hz must sit √2 above the
 * simulation and the deviation is 20·log10(√2) everywhere.
 */
const FLOOR = 10e-9;
const frequency = [20, 100, 1000, 10_000, 20_000];
const simulatedNoise = { frequency, output_density: frequency.map(() => FLOOR) };
const measured = { frequency, level_db: frequency.map(() => 20 * Math.log10(FLOOR * Math.SQRT2)) };
const band = { fromHz: 20, toHz: 20_000, alignHz: 1000 };

describe("dbvToDensity", () => {
  it("inverts 20·log10 re 1 V/√Hz (dBV definition, common practice)", () => {
    expect(dbvToDensity(0)).toBe(1);
    expect(dbvToDensity(-160)).toBeCloseTo(1e-8, 20);
    expect(dbvToDensity(-140)).toBeCloseTo(1e-7, 19);
  });
});

describe("compareChosen with a noise spectrum", () => {
  it("compares as measured (no alignment) and overlays in V/√Hz", () => {
    const chosen = compareChosen("noise_spectrum", measured, { response: null, noise: simulatedNoise }, band);
    if (!chosen.result.ok) throw new Error(chosen.result.message);
    expect(chosen.result.comparison.max?.deviation_db).toBeCloseTo(20 * Math.log10(Math.SQRT2), 9);
    const overlay = overlayOf(chosen, { id: "m1", name: "Rig noise" });
    expect(overlay?.kind).toBe("noise_spectrum");
    if (overlay?.kind !== "noise_spectrum") return;
    for (const d of overlay.density_v) expect(d / FLOOR).toBeCloseTo(Math.SQRT2, 9);
    // drawn as one more trace on the noise plot, after the simulated total
    const traces = noiseTraces({ ...simulatedNoise, contributions: {} } as never, { label: overlay.label, frequency: overlay.frequency, density: overlay.density_v, colour: "#000" }) as { name: string; y: number[] }[];
    expect(traces.map((t) => t.name)).toEqual(["Total", "Rig noise (measured)"]);
    expect(traces[1].y).toEqual(overlay.density_v);
  });

  it("says what to add when the simulation has no noise analysis", () => {
    const chosen = compareChosen("noise_spectrum", measured, { response: { frequency, level_db: frequency.map(() => 0) }, noise: null }, band);
    expect(chosen.result).toEqual({ ok: false, message: expect.stringMatching(/no noise analysis.*Add a noise analysis/) });
    expect(overlayOf(chosen, { id: "m1", name: "x" })).toBeNull();
  });

  it("still aligns a frequency response at the chosen frequency (a 6 dB rig gain comes off)", () => {
    const response = { frequency, level_db: frequency.map(() => -40) };
    const chosen = compareChosen("frequency_response", { frequency, level_db: frequency.map(() => -34) }, { response, noise: simulatedNoise }, band);
    if (chosen.kind !== "frequency_response" || !chosen.result.ok) throw new Error("expected a response comparison");
    expect(chosen.result.comparison.offset_db).toBeCloseTo(-6, 12);
    expect(overlayOf(chosen, { id: "m2", name: "Sweep" })).toMatchObject({ kind: "frequency_response", label: "Sweep (measured, −6.0 dB)" });
  });
});
