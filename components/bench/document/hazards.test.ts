import { describe, expect, it } from "vitest";
import { normaliseCircuit } from "./circuit";
import { hazardReasons } from "./hazards";

const circuit = (parts: unknown[], parameters = {}) =>
  normaliseCircuit({ format: "backplate/circuit", version: 1, parameters, parts, output: { plus: "x", minus: "0" } });
const source = (id: string, dc: string, role?: string) => ({
  id,
  kind: "vsource",
  pins: { p: "x", n: "0" },
  values: { dc },
  ...(role && { role }),
});

describe("caution reasons", () => {
  it("a 48 V phantom supply (IEC 61938) earns the caution, 12 V does not", () => {
    expect(hazardReasons(circuit([source("V1", "48", "supply")]))).toEqual([{ kind: "supply", part: "V1", volts: 48 }]);
    expect(hazardReasons(circuit([source("V1", "12", "supply")]))).toEqual([]);
  });
  it("evaluates parameters: VPOL = 80 V on a source without a role is above the 60 V limit", () => {
    expect(hazardReasons(circuit([source("V1", "VPOL")], { VPOL: "80" }))).toHaveLength(1);
  });
  it("any triode earns it; a disabled one does not", () => {
    const triode = { id: "VT1", kind: "triode", pins: { a: "x", g: "0", k: "0" }, values: { mu: 30, k: 1e-3 } };
    expect(hazardReasons(circuit([triode]))).toEqual([{ kind: "triode", part: "VT1" }]);
    expect(hazardReasons(circuit([{ ...triode, enabled: false }]))).toEqual([]);
  });
  it("uses the operating point's net voltages when given: 61 V is above, 60 V is not", () => {
    expect(hazardReasons(circuit([]), { a: 61, b: 60, c: -75 })).toEqual([
      { kind: "high-net", net: "a", volts: 61 },
      { kind: "high-net", net: "c", volts: -75 },
    ]);
  });
  it("with the operating point, still names a 48 V supply and a triode; an 80 V source without a role shows as its net", () => {
    const triode = { id: "VT1", kind: "triode", pins: { a: "x", g: "0", k: "0" }, values: { mu: 30, k: 1e-3 } };
    const parts = [source("V1", "48", "supply"), source("V2", "80"), triode];
    expect(hazardReasons(circuit(parts), { x: 80, "0": 0 })).toEqual([
      { kind: "supply", part: "V1", volts: 48 },
      { kind: "triode", part: "VT1" },
      { kind: "high-net", net: "x", volts: 80 },
    ]);
  });
});
