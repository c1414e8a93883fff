import { describe, expect, it } from "vitest";
import { elaborate } from "@/sim/circuit/elaborate";
import { runCircuit } from "@/sim/run";
import { canonicalPartition, syncNets } from "../document/nets";
import { STARTING_POINTS, startingPointDocument, startingPointFiles } from "./starting-points";

describe("starting points", () => {
  it("offers the five generic topologies", () => {
    expect(STARTING_POINTS.map((p) => p.id)).toEqual([
      "polarised-jfet",
      "electret-jfet",
      "valve-transformer",
      "valve-bipolar",
      "phantom-jfet",
    ]);
  });

  for (const point of STARTING_POINTS) {
    it(`${point.id}: elaborates, simulates and has a drawing that makes its nets`, () => {
      const document = startingPointDocument(point);
      expect(() => elaborate(document.circuit)).not.toThrow();
      const out = runCircuit(document.circuit);
      // a capsule is driven in each, so the sensitivity exists and is a plausible microphone figure (common practice:
      // condenser front ends sit between about −60 and −20 dB re 1 V/Pa)
      const s = out.figures.sensitivity_db_re_1v_per_pa as number;
      expect(s).toBeGreaterThan(-70);
      expect(s).toBeLessThan(-15);
      expect(out.figures.low_corner_hz).not.toBeNull();
      // every active device conducts
      for (const [id, part] of Object.entries(out.op?.parts ?? {})) {
        const region = (part as { region?: string }).region;
        if (region !== undefined) expect([id, region]).not.toEqual([id, "cut-off"]);
      }
      expect(canonicalPartition(syncNets(document.circuit, document.layout).circuit)).toEqual(
        canonicalPartition(document.circuit),
      );
      expect(Object.keys(document.layout.parts).length).toBe(document.circuit.parts.length);
    });
  }

  it("gives the files a create request sends, or null for an unknown id", () => {
    expect(startingPointFiles("electret-jfet")?.layout.wires.length).toBeGreaterThan(0);
    expect(startingPointFiles("nonsense")).toBeNull();
  });
});
