import { describe, expect, it } from "vitest";
import { cableLoading } from "@/sim/calculators";
import { runCircuit } from "@/sim/run";
import { DESTINATION_PRESETS, describeImpedance } from "./presets";
import { withDestination } from "./with-destination";

/** A 1 V source behind R_src: the Thévenin source sim/calculators/cable-loading models. */
const source = (rSrc: number) => ({
  format: "backplate/circuit",
  version: 1,
  parts: [
    { id: "VIN", kind: "vsource", pins: { p: "in", n: "0" }, values: { ac: 1 } },
    { id: "RSRC", kind: "resistor", pins: { a: "in", b: "out" }, values: { resistance: rSrc } },
  ],
  output: { plus: "out", minus: "0" },
});

/** The engine finds corners to 0.1 % (contract); the lumped closed form ignores the pi-sections' distribution. */
const CORNER_RELATIVE_TOLERANCE = 0.005;

describe("withDestination", () => {
  it("appends a cable and a load and moves the output to the load end", () => {
    const out = withDestination(source(200), DESTINATION_PRESETS[0], 10);
    expect(out.parts.map((p) => p.id)).toEqual(["VIN", "RSRC", "DEST_CABLE", "DEST_LOAD"]);
    expect(out.output).toEqual({ plus: "destination", minus: "0" });
    expect(out.parts[2].pins).toEqual({ a: "out", b: "destination", ref: "0" });
    expect(out.parts[3].pins).toEqual({ p: "destination", n: "0" });
    // the original is untouched
    expect(source(200).parts).toHaveLength(2);
  });

  it("loss at 1 kHz and corner match sim/calculators' cable-loading closed form (ideal conductor)", () => {
    const rSrc = 1e3;
    const lengthM = 20;
    for (const preset of DESTINATION_PRESETS) {
      const file = withDestination(source(rSrc), preset, lengthM, { resistancePerM: 0 });
      const { figures } = runCircuit(file);
      const expected = cableLoading({
        sourceResistanceOhm: rSrc,
        cableCapacitanceF: lengthM * 100e-12,
        inputResistanceOhm: preset.resistanceOhm,
        inputCapacitanceF: preset.capacitanceF,
      });
      expect(figures.gain_1khz_db).toBeCloseTo(expected.lossAt1kHzDb, 2);
      // the engine's high corner is −3 dB from 1 kHz, the closed form's from DC; both equal within the
      // passband flatness of these cases (a pole well above 1 kHz)
      const corner = figures.high_corner_hz as number;
      expect(Math.abs(corner / (expected.cornerHz as number) - 1)).toBeLessThan(CORNER_RELATIVE_TOLERANCE);
    }
  });

  it("a length of 0 puts the load straight on the output; ids never collide", () => {
    const base = source(1e3);
    const taken = {
      ...base,
      parts: [
        ...base.parts,
        { id: "DEST_LOAD", kind: "resistor", pins: { a: "out", b: "0" }, values: { resistance: 1e6 } },
      ],
    };
    const out = withDestination(taken, { resistanceOhm: 1e3, capacitanceF: 0 }, 0);
    expect(out.parts.at(-1)?.id).toBe("DEST_LOAD_2");
    expect(out.output).toEqual(base.output);
    // 1 kΩ into 1 kΩ ∥ 1 MΩ: 20·log10(999.0/1999.0) (divider, closed form)
    const rl = 1 / (1 / 1e3 + 1 / 1e6);
    expect(runCircuit(out).figures.gain_1khz_db).toBeCloseTo(20 * Math.log10(rl / (1e3 + rl)), 6);
  });

  it("rejects a bad destination with a message saying what to fix", () => {
    expect(() => withDestination(source(1e3), { resistanceOhm: 0, capacitanceF: 0 }, 5)).toThrow(/greater than 0/);
    expect(() => withDestination(source(1e3), { resistanceOhm: 1e3, capacitanceF: 0 }, -1)).toThrow(/0 m or more/);
    expect(describeImpedance(DESTINATION_PRESETS[0])).toBe("1.2 kΩ ∥ 470 pF");
  });
});
