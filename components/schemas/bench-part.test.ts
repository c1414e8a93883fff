import { describe, expect, it } from "vitest";
import { parameterSchema, partSheetSchema } from "./bench-part";

const base = {
  id: "R1",
  tolerance: { resistance: "" },
  tolerance_distribution: "uniform" as const,
  enabled: true,
  noiseless: false,
  role: "" as const,
  notes: "",
};
const schema = partSheetSchema({ kind: "resistor", id: "R1", otherIds: ["R2"], parameters: { RB: "1G" } });

describe("part sheet schema", () => {
  it("accepts the engine's syntax: RKM code, SI prefix with unit, expressions over parameters", () => {
    for (const value of ["4k7", "4.7 kΩ", "1G", "RB*2", "100meg"]) {
      expect(schema.safeParse({ ...base, values: { resistance: value } }).success).toBe(true);
    }
  });

  it("rejects a value the engine rejects, with the engine's message at the field", () => {
    const result = schema.safeParse({ ...base, values: { resistance: "4.7 pF" } });
    expect(result.success).toBe(false);
    const issue = result.error?.issues[0];
    expect(issue?.path).toEqual(["values", "resistance"]);
    expect(issue?.message).toMatch(/R1\.resistance/);
  });

  it("rejects a zero resistance (the contract: resistance > 0) and an unknown parameter", () => {
    expect(schema.safeParse({ ...base, values: { resistance: "0" } }).success).toBe(false);
    expect(schema.safeParse({ ...base, values: { resistance: "RX*2" } }).success).toBe(false);
  });

  it("refuses an id another part has and an empty required value", () => {
    expect(schema.safeParse({ ...base, id: "R2", values: { resistance: "1k" } }).success).toBe(false);
    expect(schema.safeParse({ ...base, values: { resistance: "" } }).success).toBe(false);
  });

  it("checks tolerances: 5% and 0.05 are fine, 120% is not", () => {
    expect(schema.safeParse({ ...base, values: { resistance: "1k" }, tolerance: { resistance: "5%" } }).success).toBe(true);
    expect(schema.safeParse({ ...base, values: { resistance: "1k" }, tolerance: { resistance: "0.05" } }).success).toBe(true);
    expect(schema.safeParse({ ...base, values: { resistance: "1k" }, tolerance: { resistance: "120%" } }).success).toBe(false);
  });

  it("a load needs a resistance or a capacitance (the contract)", () => {
    const load = partSheetSchema({ kind: "load", id: "IN1", otherIds: [], parameters: {} });
    const input = { ...base, id: "IN1", tolerance: { resistance: "", capacitance: "" } };
    expect(load.safeParse({ ...input, values: { resistance: "", capacitance: "" } }).success).toBe(false);
    expect(load.safeParse({ ...input, values: { resistance: "", capacitance: "1n" } }).success).toBe(true);
  });
});

describe("parameter schema", () => {
  it("accepts a new parameter that evaluates and refuses a bad name, a duplicate and a cycle", () => {
    const params = { RB: "1G", A: "B*2", B: "1k" };
    expect(parameterSchema(params).safeParse({ name: "RS", value: "4k7" }).success).toBe(true);
    expect(parameterSchema(params).safeParse({ name: "2X", value: "1" }).success).toBe(false);
    expect(parameterSchema(params).safeParse({ name: "RB", value: "1" }).success).toBe(false);
    expect(parameterSchema(params, "B").safeParse({ name: "B", value: "A*2" }).success).toBe(false);
    expect(parameterSchema(params, "B").safeParse({ name: "B", value: "2k2" }).success).toBe(true);
  });
});
