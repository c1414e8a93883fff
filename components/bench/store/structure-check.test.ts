import { describe, expect, it } from "vitest";
import { normaliseCircuit } from "../document/circuit";
import { structureProblem } from "./structure-check";

describe("structure check", () => {
  it("names the net of a capacitor-coupled node with no DC path (the contract's rule)", () => {
    const circuit = normaliseCircuit({
      format: "backplate/circuit",
      version: 1,
      parts: [
        { id: "V1", kind: "vsource", pins: { p: "in", n: "0" }, values: { dc: "1" } },
        { id: "C1", kind: "capacitor", pins: { a: "in", b: "float" }, values: { capacitance: "1n" } },
      ],
      output: { plus: "float", minus: "0" },
    });
    expect(structureProblem(circuit)).toMatchObject({ code: "no_dc_path", net: "float" });
  });
  it("names the part of a value that does not parse, and passes a good circuit", () => {
    const circuit = normaliseCircuit({
      format: "backplate/circuit",
      version: 1,
      parts: [{ id: "R1", kind: "resistor", pins: { a: "x", b: "0" }, values: { resistance: "RX" } }],
      output: { plus: "x", minus: "0" },
    });
    expect(structureProblem(circuit)).toMatchObject({ part: "R1" });
    circuit.parts[0].values.resistance = "1k";
    expect(structureProblem(circuit)).toBeNull();
  });
});
