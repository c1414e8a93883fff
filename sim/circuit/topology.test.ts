import { describe, expect, it } from "vitest";
import { isSimError, type SimError } from "../errors";
import { elaborate } from "./elaborate";
import { type TestPart, withParts } from "./test-files";
import { checkTopology } from "./topology";

function problem(
  edit: (parts: TestPart[]) => TestPart[],
  overrides: Record<string, unknown> = {},
): SimError | undefined {
  try {
    checkTopology(elaborate(withParts(edit, overrides)));
    return undefined;
  } catch (error) {
    if (isSimError(error)) return error;
    throw error;
  }
}
const without = (id: string) => (parts: TestPart[]) => parts.filter((p) => p.id !== id);
const adding =
  (...extra: TestPart[]) =>
  (parts: TestPart[]) => [...parts, ...extra];

describe("DC path to ground (the contract's op rules)", () => {
  it("passes the follower", () => {
    expect(problem((parts) => parts)).toBeUndefined();
  });

  it("names a net that only capacitors and a capsule reach, and says what to add", () => {
    const error = problem(without("R1"));
    expect(error?.code).toBe("no_dc_path");
    expect(error?.net).toBe("dia");
    expect(error?.message).toMatch(/^Net dia has no DC path to ground/);
    expect(error?.message).toContain("add a bias resistor from dia to ground or to a supply");
  });

  it("gives a JFET gate no DC path", () => {
    expect(problem(without("RG"))?.net).toBe("g");
  });

  it("gives a triode grid, a current source and a vccs output no DC path", () => {
    const triode = { id: "T1", kind: "triode", pins: { a: "vdd", g: "tg", k: "0" }, values: { mu: 20, k: "18u" } };
    expect(problem(adding(triode))?.net).toBe("tg");
    const current = { id: "I1", kind: "isource", pins: { p: "0", n: "ix" }, values: { dc: "1m" } };
    const cap = { id: "CX", kind: "capacitor", pins: { a: "ix", b: "0" }, values: { capacitance: "1n" } };
    expect(problem(adding(current, cap))?.net).toBe("ix");
    const vccs = {
      id: "G1",
      kind: "vccs",
      pins: { p: "0", n: "gx", cp: "s", cn: "0" },
      values: { transconductance: "1m" },
    };
    expect(problem(adding(vccs))?.net).toBe("gx");
    const capacitiveLoad = { id: "LD", kind: "load", pins: { p: "lx", n: "0" }, values: { capacitance: "1n" } };
    const coupling = { id: "CC", kind: "capacitor", pins: { a: "s", b: "lx" }, values: { capacitance: "1u" } };
    expect(problem(adding(capacitiveLoad, coupling))?.net).toBe("lx");
  });

  it("conducts through each transformer winding to its own pins only", () => {
    const transformer = {
      id: "T1",
      kind: "transformer",
      pins: { p1: "s", p2: "0", s1: "o1", s2: "o2" },
      values: { ratio: 0.2, primary_inductance: 100, primary_resistance: 1000 },
    };
    expect(problem(adding(transformer))?.net).toBe("o1");
    const ground = { id: "RO", kind: "resistor", pins: { a: "o2", b: "0" }, values: { resistance: "10" } };
    expect(problem(adding(transformer, ground))).toBeUndefined();
  });

  it("conducts through a cable conductor, a BJT base–emitter and a resistive load", () => {
    const cable = { id: "W1", kind: "cable", pins: { a: "s", b: "far", ref: "0" }, values: { length: 5 } };
    const bjt = { id: "Q1", kind: "bjt", pins: { c: "vdd", b: "qb", e: "far" } };
    const load = { id: "LD", kind: "load", pins: { p: "far", n: "0" }, values: { resistance: "1k2" } };
    expect(problem(adding(cable, bjt, load))).toBeUndefined();
  });
});

describe("loops of voltage sources and zero-resistance branches", () => {
  it("finds two voltage sources in parallel and lists the loop", () => {
    const error = problem(adding({ id: "V3", kind: "vsource", pins: { p: "vdd", n: "0" }, values: { dc: 9 } }));
    expect(error?.code).toBe("source_loop");
    expect(error?.part).toBe("V3");
    expect(error?.message).toContain("(V2, V3)");
  });

  it("finds a loop through an inductor and an ideal cable, but not through a resistive inductor", () => {
    const inductor = { id: "L1", kind: "inductor", pins: { a: "vdd", b: "m" }, values: { inductance: "10m" } };
    const cable = {
      id: "W1",
      kind: "cable",
      pins: { a: "m", b: "0", ref: "0" },
      values: { length: 1, resistance_per_m: 0 },
    };
    const error = problem(adding(inductor, cable));
    expect(error?.code).toBe("source_loop");
    expect(error?.message).toContain("(L1, V2, W1) between nets m and 0");
    const lossy = { ...inductor, values: { inductance: "10m", series_resistance: "1" } };
    expect(problem(adding(lossy, cable))).toBeUndefined();
  });

  it("finds a vcvs output across a voltage source", () => {
    const vcvs = { id: "E1", kind: "vcvs", pins: { p: "pol", n: "0", cp: "s", cn: "0" }, values: { gain: 2 } };
    expect(problem(adding(vcvs))?.code).toBe("source_loop");
  });
});

describe("shorted sources and the output", () => {
  it("reports a source whose two pins sit on one net", () => {
    const error = problem(adding({ id: "V9", kind: "vsource", pins: { p: "s", n: "s" }, values: { dc: 1 } }));
    expect(error?.code).toBe("shorted_source");
    expect(error?.part).toBe("V9");
    expect(error?.net).toBe("s");
  });

  it("reports an output net no part touches", () => {
    const error = problem((parts) => parts, { output: { plus: "outt", minus: "0" } });
    expect(error?.code).toBe("unknown_output_net");
    expect(error?.net).toBe("outt");
  });
});
