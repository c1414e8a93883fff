import fc from "fast-check";
import { describe, expect, it } from "vitest";
import demo from "@/sim/examples/demo-microphone.json";
import { diffCircuits, diffRecords } from "./circuit-diff";

interface TestPart {
  id: string;
  kind: string;
  pins: Record<string, string>;
  values: Record<string, string>;
  tolerance?: Record<string, string>;
  enabled?: boolean;
}

const base: {
  format: string;
  version: number;
  title: string;
  parameters: Record<string, string>;
  parts: TestPart[];
  output: { plus: string; minus: string };
  variants: { name: string; parameters: Record<string, string> }[];
} = {
  format: "backplate/circuit",
  version: 1,
  title: "Divider",
  parameters: { RB: "1G", VPOL: "60" },
  parts: [
    { id: "R1", kind: "resistor", pins: { a: "in", b: "out" }, values: { resistance: "4k7" } },
    { id: "R2", kind: "resistor", pins: { a: "out", b: "0" }, values: { resistance: "10k" }, tolerance: { resistance: "5%" } },
    { id: "C1", kind: "capacitor", pins: { a: "out", b: "0" }, values: { capacitance: "1n" } },
  ],
  output: { plus: "out", minus: "0" },
  variants: [{ name: "pad", parameters: {} }],
};

const clone = <T>(v: T): T => structuredClone(v);

describe("diffCircuits", () => {
  it("reports nothing for identical files, including a real example circuit", () => {
    expect(diffCircuits(base, clone(base)).same).toBe(true);
    expect(diffCircuits(demo, clone(demo))).toMatchObject({ same: true, partsChanged: [], parameters: [] });
  });

  it("finds added and removed parts with their values", () => {
    const next = clone(base);
    next.parts = next.parts.filter((p) => p.id !== "C1");
    next.parts.push({ id: "L1", kind: "inductor", pins: { a: "in", b: "0" }, values: { inductance: "10m" } });
    const diff = diffCircuits(base, next);
    expect(diff.partsAdded).toEqual([{ id: "L1", kind: "inductor", values: { inductance: "10m" } }]);
    expect(diff.partsRemoved).toEqual([{ id: "C1", kind: "capacitor", values: { capacitance: "1n" } }]);
    expect(diff.partsChanged).toEqual([]);
    expect(diff.same).toBe(false);
  });

  it("finds changed values as written, changed pins, tolerances and the on/off switch", () => {
    const next = clone(base);
    next.parts[0] = { ...next.parts[0], values: { resistance: "10k" } };
    next.parts[1] = { ...next.parts[1], pins: { a: "out", b: "gnd2" }, tolerance: {}, enabled: false };
    const diff = diffCircuits(base, next);
    expect(diff.partsChanged).toEqual([
      { id: "R1", kind: "resistor", values: [{ name: "resistance", before: "4k7", after: "10k" }], pins: [], tolerance: [] },
      {
        id: "R2",
        kind: "resistor",
        values: [],
        pins: [{ name: "b", before: "0", after: "gnd2" }],
        tolerance: [{ name: "resistance", before: "5%", after: null }],
        enabled: { before: true, after: false },
      },
    ]);
  });

  it("reports a part whose kind changed under the same id", () => {
    const next = clone(base);
    next.parts[2] = { ...next.parts[2], kind: "inductor", values: { inductance: "1m" } };
    const [change] = diffCircuits(base, next).partsChanged;
    expect(change).toMatchObject({ id: "C1", kind: "inductor", kindBefore: "capacitor" });
    expect(change.values).toEqual([
      { name: "capacitance", before: "1n", after: null },
      { name: "inductance", before: null, after: "1m" },
    ]);
  });

  it("finds parameters added, removed and changed, variants, output and title", () => {
    const next = { ...clone(base), title: "Divider, padded", parameters: { RB: "2G", VDD: "12" } };
    next.variants = [{ name: "hotter bias", parameters: {} }];
    next.output = { plus: "in", minus: "0" };
    const diff = diffCircuits(base, next);
    expect(diff.parameters).toEqual([
      { name: "RB", before: "1G", after: "2G" },
      { name: "VPOL", before: "60", after: null },
      { name: "VDD", before: null, after: "12" },
    ]);
    expect(diff.variantsAdded).toEqual(["hotter bias"]);
    expect(diff.variantsRemoved).toEqual(["pad"]);
    expect(diff.output).toEqual({ before: "out − 0", after: "in − 0" });
    expect(diff.title).toEqual({ before: "Divider", after: "Divider, padded" });
  });

  it("treats a first revision (no parent) as every part added", () => {
    const diff = diffCircuits(null, base);
    expect(diff.partsAdded.map((p) => p.id)).toEqual(["R1", "R2", "C1"]);
    expect(diff.partsRemoved).toEqual([]);
  });

  it("compares numbers and strings by what was written (47000 differs from 47k)", () => {
    expect(diffRecords({ r: "47000" }, { r: "47k" })).toEqual([{ name: "r", before: "47000", after: "47k" }]);
  });

  it("is antisymmetric: swapping the files swaps added and removed (property)", () => {
    const partArb = fc.record({
      id: fc.constantFrom("R1", "R2", "C1", "J1"),
      kind: fc.constantFrom("resistor", "capacitor"),
      pins: fc.constant({ a: "x", b: "0" }),
      values: fc.record({ v: fc.constantFrom("1k", "2k2", "4n7") }),
    });
    const fileArb = fc.uniqueArray(partArb, { selector: (p) => p.id }).map((parts) => ({ parts, output: { plus: "x", minus: "0" } }));
    fc.assert(
      fc.property(fileArb, fileArb, (a, b) => {
        const ab = diffCircuits(a, b);
        const ba = diffCircuits(b, a);
        expect(ab.partsAdded.map((p) => p.id).sort()).toEqual(ba.partsRemoved.map((p) => p.id).sort());
        expect(ab.partsChanged.map((p) => p.id).sort()).toEqual(ba.partsChanged.map((p) => p.id).sort());
        expect(ab.same).toBe(ba.same);
      }),
    );
  });
});
