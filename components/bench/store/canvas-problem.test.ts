import { describe, expect, it } from "vitest";
import type { SimErrorJson } from "@/sim/errors";
import { normaliseCircuit } from "../document/circuit";
import { canvasProblem } from "./canvas-problem";

const circuit = normaliseCircuit({
  format: "backplate/circuit",
  version: 1,
  parts: [
    { id: "V1", kind: "vsource", pins: { p: "vdd", n: "0" }, values: { dc: "12" } },
    { id: "R1", kind: "resistor", pins: { a: "vdd", b: "out" }, values: { resistance: "1k" } },
  ],
  output: { plus: "out", minus: "0" },
});
const err = (fields: Partial<SimErrorJson>): SimErrorJson =>
  ({ code: "no_convergence", message: "did not converge", ...fields }) as SimErrorJson;

describe("the error the canvas marks", () => {
  it("prefers the structure check, which is always about the circuit as drawn now", () => {
    const structure = err({ code: "no_dc_path", net: "out" });
    expect(canvasProblem(structure, err({ part: "R1" }), circuit)).toBe(structure);
  });
  it("marks the live solve's part or net while it is still in the drawing", () => {
    expect(canvasProblem(null, err({ part: "R1" }), circuit)).toMatchObject({ part: "R1" });
    expect(canvasProblem(null, err({ net: "vdd" }), circuit)).toMatchObject({ net: "vdd" });
    expect(canvasProblem(null, err({ net: "0" }), circuit)).toMatchObject({ net: "0" });
  });
  it("drops a solve error that names a part or net no longer drawn, or names neither", () => {
    expect(canvasProblem(null, err({ part: "J9" }), circuit)).toBeNull();
    expect(canvasProblem(null, err({ net: "gone" }), circuit)).toBeNull();
    expect(canvasProblem(null, err({}), circuit)).toBeNull();
    expect(canvasProblem(null, null, circuit)).toBeNull();
  });
});
