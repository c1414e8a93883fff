import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { runCircuit } from "@/sim/run";
import { DESTINATION_PRESETS } from "../destinations/presets";
import { solveFamily, solveImpedance, solveLive } from "./compute";

const demo = JSON.parse(
  fs.readFileSync(path.resolve(import.meta.dirname, "../../../sim/examples/demo-microphone.json"), "utf8"),
);

describe("bench solver computations", () => {
  it("the live solve gives the headless command's figures for the same file (the contract's one engine)", () => {
    const live = solveLive({ circuit: demo });
    if (!live.ok) throw new Error(live.error.message);
    expect(live.value.document.figures).toEqual(runCircuit(demo).figures);
    // |Zout| at 1 kHz on the plotted grid equals the figure (same small-signal model)
    const impedance = solveImpedance({ circuit: demo }, live.value.document.ac?.frequency ?? []);
    if (!impedance.ok) throw new Error(impedance.error.message);
    const i = impedance.value.frequency.indexOf(1000);
    expect(impedance.value.magnitude_ohm[i]).toBeCloseTo(
      live.value.document.figures.output_impedance_1khz_ohm as number,
      6,
    );
  });

  it("an engine error comes back as JSON naming the part and field, never thrown", () => {
    const broken = structuredClone(demo);
    broken.parts.find((p: { id: string }) => p.id === "RSRC").values.resistance = "4k7x";
    const live = solveLive({ circuit: broken });
    expect(live.ok).toBe(false);
    if (live.ok) return;
    expect(live.error.part).toBe("RSRC");
    expect(live.error.field).toBe("resistance");
    expect(live.error.message).toMatch(/RSRC/);
  });

  it("the family has one curve per destination, variant and sweep value, with progress", () => {
    const seen: number[] = [];
    const family = solveFamily(
      {
        circuit: demo,
        destinations: DESTINATION_PRESETS.slice(0, 2),
        cableLengthM: 10,
        variants: ["hotter bias", "no such variant"],
        sweep: { parameter: "RS", values: ["2k2", "10k"] },
        revisions: [],
      },
      (done) => seen.push(done),
    );
    expect(family.curves.map((c) => c.group)).toEqual([
      "destination",
      "destination",
      "variant",
      "variant",
      "sweep",
      "sweep",
    ]);
    expect(seen).toEqual([1, 2, 3, 4, 5, 6]);
    // the hotter-bias variant (80 V instead of 60 V) is 20·log10(80/60) dB more sensitive: sensitivity ∝ polarisation
    // (capsule EMF = V0 · strain · p, the circuit-file contract)
    const hot = family.curves[2].figures?.sensitivity_db_re_1v_per_pa as number;
    const base = runCircuit(demo).figures.sensitivity_db_re_1v_per_pa as number;
    expect(hot - base).toBeCloseTo(20 * Math.log10(80 / 60), 3);
    expect(family.curves[3].error?.code).toBe("unknown_variant");
    expect(family.spread).toBeNull();
  });
});
