import { describe, expect, it } from "vitest";
import { niceAxis, plotGeometry } from "./plot-geometry";

// Axis ticks on the 1-2-5 sequence of round steps (common practice for chart axes), about five to an axis.
describe("round axis ticks", () => {
  it("widens a magnitude range to whole steps of ten", () => {
    expect(niceAxis(-76, -38)).toEqual({ lo: -80, hi: -30, step: 10, ticks: [-80, -70, -60, -50, -40, -30] });
  });

  it("picks 2 × a power of ten where 1 would give too many ticks and 5 too few", () => {
    expect(niceAxis(0.2, 0.9)).toEqual({ lo: 0.2, hi: 1, step: 0.2, ticks: [0.2, 0.4, 0.6, 0.8, 1] });
  });

  it("takes a phase axis in the steps given: 45° for −180…0°", () => {
    expect(niceAxis(-178, -2, [15, 30, 45, 90, 180]).ticks).toEqual([-180, -135, -90, -45, 0]);
  });

  it("gives the report's plot the same ticks, and whole decades on a log axis", () => {
    const series = [{ label: "s", colour: "#000", frequency: [10, 100, 1000], values: [-76, -40, -38] }];
    const plot = plotGeometry(series, { width: 400, height: 200, yUnit: "dB" });
    expect(plot?.yTicks.map((t) => t.label)).toEqual(["-80", "-70", "-60", "-50", "-40", "-30"]);
    const noise = [{ label: "n", colour: "#000", frequency: [10, 100, 1000], values: [3e-7, 2e-8, 4e-9] }];
    const log = plotGeometry(noise, { width: 400, height: 200, yUnit: "V/√Hz", yLog: true });
    expect(log?.yTicks.map((t) => t.label)).toEqual(["1n", "10n", "100n", "1µ"]);
  });
});
