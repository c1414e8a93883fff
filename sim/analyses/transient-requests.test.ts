import { describe, expect, it } from "vitest";
import { elaborate } from "../circuit/elaborate";
import { SimError } from "../errors";
import { runCircuit } from "../run";

/** A small file whose analyses each test replaces (the contract's file shape). */
const file = (analyses: Record<string, unknown>) => ({
  format: "backplate/circuit",
  version: 1,
  parts: [
    { id: "V1", kind: "vsource", role: "input", pins: { p: "in", n: "0" }, values: { dc: 0, ac: 1 } },
    { id: "R1", kind: "resistor", pins: { a: "in", b: "out" }, values: { resistance: "1k" } },
    { id: "C1", kind: "capacitor", pins: { a: "out", b: "0" }, values: { capacitance: "1u" } },
  ],
  output: { plus: "out", minus: "0" },
  analyses,
});

function fieldOf(analyses: Record<string, unknown>): string | undefined {
  try {
    elaborate(file(analyses));
  } catch (e) {
    expect(e).toBeInstanceOf(SimError);
    expect((e as SimError).code).toBe("invalid_analysis");
    return (e as SimError).field;
  }
  throw new Error("expected an error");
}

describe("large-signal requests", () => {
  it("elaborates transient, distortion and ripple with their defaults", () => {
    const c = elaborate(
      file({
        transient: { stop: "10m", step: "10u", drive: { frequency: "1k", level: 0.5 }, probe: ["out"] },
        distortion: { frequency: 1000, levels: [0.1, "0.2"] },
        ripple: { frequencies: [100, "1k"] },
      }),
    );
    expect(c.analyses.transient).toEqual({
      stop: 0.01,
      step: 1e-5,
      from: "op",
      probe: ["out"],
      temperature: 298.15,
      drive: { shape: "sine", frequency: 1000, level: 0.5 },
    });
    expect(c.analyses.distortion).toEqual({ frequency: 1000, levels: [0.1, 0.2], temperature: 298.15 });
    expect(c.analyses.ripple?.frequencies).toEqual({ kind: "list", frequencies: [100, 1000] });
    // asking for a large-signal analysis is asking for something: no default ac/noise
    expect(c.analyses.ac).toBeUndefined();
  });

  it("names the field at fault", () => {
    expect(fieldOf({ transient: { step: 1e-6 } })).toBe("analyses.transient.stop");
    expect(fieldOf({ transient: { stop: 1e-3, step: 1 } })).toBe("analyses.transient.step");
    expect(fieldOf({ transient: { stop: 1, step: 1e-3, from: "cold" } })).toBe("analyses.transient.from");
    expect(fieldOf({ transient: { stop: 1, step: 1e-3, stpo: 1 } })).toBe("analyses.transient.stpo");
    expect(fieldOf({ transient: { stop: 1, step: 1e-3, drive: { frequency: 1000 } } })).toBe(
      "analyses.transient.drive",
    );
    expect(fieldOf({ transient: { stop: 1, step: 1e-3, drive: { shape: "burst", frequency: 1000, level: 1 } } })).toBe(
      "analyses.transient.drive.cycles",
    );
    expect(fieldOf({ transient: { stop: 1, step: 1e-3, drive: { frequency: -1, level: 1 } } })).toBe(
      "analyses.transient.drive.frequency",
    );
    expect(fieldOf({ distortion: { frequency: 1000 } })).toBe("analyses.distortion");
    expect(fieldOf({ distortion: { frequency: 1000, levels: [] } })).toBe("analyses.distortion.levels");
    expect(fieldOf({ distortion: { levels: [1] } })).toBe("analyses.distortion.frequency");
    expect(fieldOf({ ripple: { frequencies: [0] } })).toBe("analyses.ripple.frequencies[0]");
  });

  it("runs a burst through the headless document, probes and an unknown probe net", () => {
    const doc = runCircuit(
      file({
        transient: {
          stop: "3m",
          step: "20u",
          drive: { shape: "burst", frequency: 1000, level: 1, cycles: 2 },
          probe: ["in"],
        },
      }),
    );
    const t = doc.transient!;
    expect(t.time.length).toBe(t.output.length);
    expect(t.nets.in.length).toBe(t.time.length);
    // the burst ends at 2 ms (a breakpoint, hit exactly) and the source is back at its dc afterwards
    expect(t.time).toContain(0.002);
    const after = t.time.findIndex((x) => x > 0.0021);
    expect(t.nets.in[after]).toBe(0);
    expect(Object.keys(doc)).toEqual(["transient", "figures"]);
    expect(doc.figures.settle_time_s).toBeNull();
    expect(() => runCircuit(file({ transient: { stop: 1e-3, step: 1e-5, probe: ["nowhere"] } }))).toThrow(
      /no net "nowhere"/,
    );
  });
});
