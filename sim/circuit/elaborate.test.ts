import { describe, expect, it } from "vitest";
import { isSimError, type SimError } from "../errors";
import { elaborate } from "./elaborate";
import { parseFieldValue, partValuesSchema } from "./field";
import { validateCircuitFile } from "./schema";
import { followerFile, type TestPart, withParts } from "./test-files";

function failure(file: unknown, options: Parameters<typeof elaborate>[1] = {}): SimError {
  try {
    elaborate(file, options);
  } catch (error) {
    if (isSimError(error)) return error;
    throw error;
  }
  throw new Error("elaborated without error");
}
const replacePart = (id: string, change: (part: TestPart) => TestPart) => (parts: TestPart[]) =>
  parts.map((part) => (part.id === id ? change(part) : part));

describe("elaborate", () => {
  it("evaluates every value to SI and fills the contract's defaults", () => {
    const circuit = elaborate(followerFile());
    const byId = Object.fromEntries(circuit.parts.map((p) => [p.id, p]));
    expect(byId.R1.values).toEqual({ resistance: 1e9 });
    expect(byId.R1.tolerance).toEqual({ resistance: 0.1 });
    expect(byId.R1.toleranceDistribution).toBe("uniform");
    expect(byId.V1.values).toEqual({ dc: 60, ac: 0, ac_phase: 0 });
    expect(byId.MIC.values).toEqual({ capacitance: 50e-12, strain_per_pa: 2e-4, electret_voltage: 0, q: 0.7 });
    expect(byId.J1.values).toEqual({
      type: "n",
      idss: 4e-3,
      pinch_off: -2,
      lambda: 0,
      cgs: 0,
      cgd: 0,
      fc: 0,
      igss: 0,
    });
    expect(circuit.nets).toEqual(["0", "dia", "g", "pol", "s", "vdd"]);
    expect(circuit.analyses.op).toEqual({ temperature: 298.15 });
    expect(circuit.analyses.ac).toEqual({
      frequencies: { kind: "grid", from: 1, to: 100000, pointsPerDecade: 20 },
      pressure: 1,
      temperature: 298.15,
    });
    expect(circuit.parameters).toEqual({ VPOL: 60, RB: 1e9 });
  });

  it("fills Infinity for a BJT's vaf and a load's resistance", () => {
    const file = withParts((parts) => [
      ...parts,
      { id: "Q1", kind: "bjt", pins: { c: "vdd", b: "s", e: "e" } },
      { id: "RE", kind: "resistor", pins: { a: "e", b: "0" }, values: { resistance: "10k" } },
      { id: "LD", kind: "load", pins: { p: "e", n: "0" }, values: { capacitance: "1n" } },
    ]);
    const parts = Object.fromEntries(elaborate(file).parts.map((p) => [p.id, p]));
    expect(parts.Q1.values).toEqual({
      type: "npn",
      is: 1e-14,
      beta: 100,
      beta_r: 1,
      vaf: Infinity,
      rbb: 0,
      cpi: 0,
      cmu: 0,
    });
    expect(parts.LD.values).toEqual({ resistance: Infinity, capacitance: 1e-9 });
  });

  it("runs op, ac and noise with the contract's grids when the file asks for nothing", () => {
    const { analyses } = elaborate(followerFile({ analyses: undefined }));
    expect(analyses).toEqual({
      op: { temperature: 298.15 },
      ac: { frequencies: { kind: "grid", from: 1, to: 100000, pointsPerDecade: 20 }, pressure: 1, temperature: 298.15 },
      noise: { frequencies: { kind: "grid", from: 20, to: 20000, pointsPerDecade: 20 }, temperature: 298.15 },
    });
  });

  it("applies a variant's parameters, then disable, then enable", () => {
    const file = withParts(
      (parts) => [
        ...parts,
        { id: "CP", kind: "capacitor", enabled: false, pins: { a: "dia", b: "0" }, values: { capacitance: "100p" } },
      ],
      {
        variants: [
          { name: "hotter bias", parameters: { VPOL: "80" } },
          { name: "pad", disable: ["CP"], enable: ["CP"] },
          { name: "off", disable: ["CP", "C1"] },
        ],
      },
    );
    expect(elaborate(file).parts.map((p) => p.id)).not.toContain("CP");
    const hot = elaborate(file, { variant: "hotter bias" });
    expect(hot.variant).toBe("hotter bias");
    expect(hot.parts.find((p) => p.id === "V1")?.values.dc).toBe(80);
    expect(elaborate(file, { variant: "pad" }).parts.map((p) => p.id)).toContain("CP");
    expect(elaborate(file, { variant: "off" }).parts.map((p) => p.id)).not.toContain("C1");
  });

  it("applies parameter overrides after the variant (as a sweep does)", () => {
    const circuit = elaborate(followerFile(), { variant: "hotter bias", parameters: { VPOL: 100 } });
    expect(circuit.parts.find((p) => p.id === "V1")?.values.dc).toBe(100);
    expect(failure(followerFile(), { parameters: { NOPE: 1 } }).code).toBe("unknown_parameter");
  });

  it("reports an unknown variant with the names there are", () => {
    const error = failure(followerFile(), { variant: "colder" });
    expect(error.code).toBe("unknown_variant");
    expect(error.message).toContain('"hotter bias"');
  });

  it("reports a JFET pinch-off whose sign does not match its type", () => {
    const positive = withParts(replacePart("J1", (p) => ({ ...p, values: { idss: "4m", pinch_off: "2" } })));
    const error = failure(positive);
    expect(error.code).toBe("out_of_range");
    expect(error.part).toBe("J1");
    expect(error.field).toBe("pinch_off");
    const pChannel = withParts(
      replacePart("J1", (p) => ({ ...p, values: { type: "p", idss: "4m", pinch_off: "-2" } })),
    );
    expect(failure(pChannel).message).toMatch(/p-channel/);
  });

  it("reports out-of-range values naming the part and field", () => {
    const error = failure(withParts(replacePart("RS", (p) => ({ ...p, values: { resistance: "RB-1G" } }))));
    expect(error.code).toBe("out_of_range");
    expect(error.message).toMatch(/^RS\.resistance: "RB-1G" \(= 0\) is out of range/);
    expect(failure(withParts(replacePart("RS", (p) => ({ ...p, values: { resistance: "inf" } })))).code).toBe(
      "out_of_range",
    );
  });

  it.each([
    ["wrong unit", { capacitance: "50 pH" }, "C1", "wrong_unit"],
    ["value that does not parse", { capacitance: "1nn" }, "C1", "invalid_value"],
    ["unknown parameter", { capacitance: "CX*2" }, "C1", "unknown_parameter"],
    ["unknown value name", { capacitance: "1n", capacitence: "1n" }, "C1", "invalid_value"],
  ])("reports a %s", (_, values, part, code) => {
    const error = failure(withParts(replacePart("C1", (p) => ({ ...p, values }))));
    expect(error.code).toBe(code);
    expect(error.part).toBe(part);
  });

  it("reports a missing required value", () => {
    const error = failure(withParts(replacePart("C1", (p) => ({ ...p, values: {} }))));
    expect(error.code).toBe("invalid_value");
    expect(error.message).toContain("C1.capacitance");
  });
});

describe("the file schema", () => {
  it("accepts every shape the contract allows and extra fields such as layout", () => {
    const result = validateCircuitFile({ ...followerFile(), layout: { R1: { x: 1, y: 2 } } });
    expect(result.ok).toBe(true);
  });

  it.each([
    ["an unknown kind", withParts(replacePart("C1", (p) => ({ ...p, kind: "capacitr" }))), "unknown_kind", "C1"],
    [
      "an unknown pin",
      withParts(replacePart("C1", (p) => ({ ...p, pins: { a: "dia", b: "g", c: "0" } }))),
      "unknown_pin",
      "C1",
    ],
    ["a missing pin", withParts(replacePart("J1", (p) => ({ ...p, pins: { d: "vdd", g: "g" } }))), "missing_pin", "J1"],
    ["a duplicate id", withParts((parts) => [...parts, { ...parts[1] }]), "duplicate_id", "R1"],
    [
      "a variant naming a missing part",
      followerFile({ variants: [{ name: "x", disable: ["R9"] }] }),
      "unknown_part",
      "R9",
    ],
  ])("reports %s with the part", (_, file, code, part) => {
    const error = failure(file);
    expect(error.code).toBe(code);
    expect(error.part).toBe(part);
    expect(error.message).toContain(part);
  });

  it("explains a missing pin", () => {
    const error = failure(withParts(replacePart("J1", (p) => ({ ...p, pins: { d: "vdd", g: "g" } }))));
    expect(error.message).toBe(
      'J1: pin s is not connected. Connect every pin of a JFET (d, g, s) to a net, such as "s": "0".',
    );
  });

  it.each([
    ["not an object", 42],
    ["the wrong format", followerFile({ format: "other" })],
    ["the wrong version", followerFile({ version: 2 })],
    ["no parts", { ...followerFile(), parts: undefined }],
    [
      "a net that is not a string",
      withParts(replacePart("RS", (p) => ({ ...p, pins: { a: "s", b: 0 as unknown as string } }))),
    ],
  ])("reports %s as invalid_file", (_, file) => {
    expect(failure(file).code).toBe("invalid_file");
  });

  it("reports bad analyses as invalid_analysis", () => {
    expect(failure(followerFile({ analyses: { ac: { from: 100, to: 10 } } })).code).toBe("invalid_analysis");
    expect(failure(followerFile({ analyses: { AC: {} } })).code).toBe("invalid_analysis");
    expect(failure(followerFile({ analyses: { ac: { from: "1 V" } } })).code).toBe("invalid_analysis");
    expect(failure(followerFile({ analyses: { ac: { frequencies: [1, 2], from: 1 } } })).code).toBe("invalid_analysis");
    expect(failure(followerFile({ analyses: { sweep: { parameter: "NOPE", values: [1] } } })).code).toBe(
      "unknown_parameter",
    );
  });

  it("lists every problem for the editor", () => {
    const file = withParts((parts) => [
      ...parts,
      { id: "X1", kind: "wire", pins: {} },
      { id: "X2", kind: "resistor", pins: { a: "s" }, values: { resistance: "1k" } },
    ]);
    const result = validateCircuitFile(file);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.map((e) => e.code)).toEqual(["unknown_kind", "missing_pin"]);
  });
});

describe("parseFieldValue (for the part sheet's forms)", () => {
  it("returns the SI number or a message", () => {
    expect(parseFieldValue("resistor", "resistance", "4k7")).toEqual({ ok: true, value: 4700 });
    expect(parseFieldValue("resistor", "resistance", "RB*2", { RB: "1G" })).toEqual({ ok: true, value: 2e9 });
    const bad = parseFieldValue("capacitor", "capacitance", "50 pH", {}, { part: "C7" });
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.code).toBe("wrong_unit");
      expect(bad.message).toMatch(/^C7\.capacitance/);
    }
    expect(parseFieldValue("jfet", "pinch_off", "2").ok).toBe(false);
    expect(parseFieldValue("jfet", "pinch_off", "2", {}, { type: "p" })).toEqual({ ok: true, value: 2 });
    expect(parseFieldValue("jfet", "type", "p")).toEqual({ ok: true, value: "p" });
    expect(parseFieldValue("resistor", "colour", "red").ok).toBe(false);
  });
});

describe("partValuesSchema (for react-hook-form)", () => {
  it("reports each bad value on its own field", () => {
    const schema = partValuesSchema("jfet", { IDSS: "4m" });
    expect(schema.safeParse({ type: "n", idss: "IDSS", pinch_off: "-2" }).success).toBe(true);
    const result = schema.safeParse({ type: "p", idss: "4 mV", pinch_off: "-2" });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((issue) => issue.path[0])).toEqual(["idss", "pinch_off"]);
  });
});
