import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { followerFile } from "./circuit/test-files";
import type { ElaboratedCircuit } from "./circuit/types";
import { SimError } from "./errors";
import type { SimulationResult } from "./results";
import { runCircuit } from "./run";
import { runWith, withFiniteNumbers } from "./runner";

const example = (name: string): unknown => JSON.parse(readFileSync(`sim/examples/${name}.json`, "utf8"));

/** A stand-in solver that records what it was asked and answers with the circuit's parameters as figures. */
function recordingSimulate() {
  const seen: ElaboratedCircuit[] = [];
  const simulate = (circuit: ElaboratedCircuit): SimulationResult => {
    seen.push(circuit);
    return {
      op: { nets: { "0": 0 }, parts: {}, warnings: [] },
      figures: { gain_1khz_db: circuit.parameters.VPOL, low_corner_hz: Number.NaN, high_corner_hz: Infinity },
    };
  };
  return { seen, simulate };
}

describe("runWith (orchestration)", () => {
  it("elaborates, checks and solves once, and replaces non-finite figures with null", () => {
    const { seen, simulate } = recordingSimulate();
    const document = runWith(simulate, followerFile());
    expect(seen).toHaveLength(1);
    expect(document.figures).toEqual({ gain_1khz_db: 60, low_corner_hz: null, high_corner_hz: null });
    expect(Object.keys(document)).toEqual(["op", "figures"]);
  });

  it("applies the variant", () => {
    const { simulate } = recordingSimulate();
    expect(runWith(simulate, followerFile(), { variant: "hotter bias" }).figures.gain_1khz_db).toBe(80);
  });

  it("repeats the other analyses for each sweep value, with the parameter overridden", () => {
    const { seen, simulate } = recordingSimulate();
    const file = followerFile({ analyses: { op: {}, sweep: { parameter: "VPOL", values: [40, "50", "0.1k"] } } });
    const document = runWith(simulate, file);
    expect(document.sweep?.map((point) => [point.value, point.figures.gain_1khz_db])).toEqual([
      [40, 40],
      [50, 50],
      [100, 100],
    ]);
    expect(seen).toHaveLength(4);
    for (const circuit of seen) expect(circuit.analyses.sweep).toBeUndefined();
  });

  it("stops at a structural problem before solving", () => {
    const { seen, simulate } = recordingSimulate();
    const file = followerFile({ output: { plus: "nowhere", minus: "0" } });
    expect(() => runWith(simulate, file)).toThrow(SimError);
    expect(seen).toHaveLength(0);
  });

  it("nulls NaN and infinities anywhere in a document", () => {
    expect(
      withFiniteNumbers({ a: [1, Number.NaN], b: { c: -Infinity }, d: "x", e: Float64Array.of(2, Infinity) }),
    ).toEqual({
      a: [1, null],
      b: { c: null },
      d: "x",
      e: [2, null],
    });
  });
});

describe("runCircuit on the examples (with the solver)", () => {
  it.each(["demo-microphone", "electret-jfet", "valve-transformer", "triode-emitter-follower", "bench-rc-divider"])(
    "%s gives op, ac and figures without NaN",
    (name) => {
      const document = runCircuit(example(name));
      expect(document.op).toBeDefined();
      expect(document.ac?.frequency.length).toBeGreaterThan(10);
      // noise runs where the file asks for it (of the examples, only the demo does); no example asks for a spread
      const asked = (example(name) as { analyses?: Record<string, unknown> }).analyses ?? {};
      expect(document.noise !== undefined).toBe("noise" in asked);
      if (document.noise) expect(document.noise.rms_a_weighted).toBeGreaterThan(0);
      expect(document.spread).toBeUndefined();
      expect(typeof document.figures.gain_1khz_db).toBe("number");
      expect(JSON.stringify(document)).not.toMatch(/NaN|Infinity/);
    },
  );

  it("demo: the JFET follower's operating point obeys the square law (textbook JFET equation)", () => {
    const document = runCircuit(example("demo-microphone"));
    const nets = document.op?.nets ?? {};
    // Shockley: Id = Idss·(1 − Vgs/Vp)²·(1 + λ·Vds), with Id = Vs/Rs; values from the demo file
    const idss = 4e-3;
    const vp = -2;
    const lambda = 0.01;
    const rs = 4700;
    const vg = nets.g;
    const vs = nets.s;
    const vgs = vg - vs;
    const expectedId = idss * (1 - vgs / vp) ** 2 * (1 + lambda * (nets.vdd - vs));
    expect(vg).toBeCloseTo(6, 6); // a 10 MΩ / 10 MΩ divider of 12 V, no gate current
    expect(vs / rs / expectedId).toBeCloseTo(1, 6);
  });

  it("bench: 1 mA into 1 kΩ is 1 V (Ohm's law), and the sweep moves the RC corner", () => {
    const document = runCircuit(example("bench-rc-divider"));
    expect(document.op?.nets.out).toBeCloseTo(1, 9);
    const corners = document.sweep?.map((point) => point.figures.high_corner_hz as number) ?? [];
    expect(document.sweep?.map((point) => point.value)).toEqual([4700, 10_000, 22_000]);
    expect(corners[0]).toBeGreaterThan(corners[1]);
    expect(corners[1]).toBeGreaterThan(corners[2]);
    expect(document.sweep?.[1].figures).toEqual(document.figures);
  });

  it("a capsule's sensitivity scales with its polarisation (the contract's capsule equation)", () => {
    const base = runCircuit(example("demo-microphone")).figures.sensitivity_v_per_pa as number;
    const hotter = runCircuit(example("demo-microphone"), { variant: "hotter bias" }).figures
      .sensitivity_v_per_pa as number;
    expect(hotter / base).toBeCloseTo(80 / 60, 6);
  });
});
