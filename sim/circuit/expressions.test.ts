import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isSimError, SimError } from "../errors";
import { evaluateValue } from "./evaluate-value";
import { prepareExpression } from "./expressions";
import { evaluateParameters } from "./parameters";
import { QUANTITIES, type QuantityName } from "./quantities";

const at = { part: "R1", field: "resistance" };
const parameters = { RB: 1e9, VPOL: 60 };
const value = (raw: string, quantity: QuantityName = "resistance") =>
  evaluateValue(raw, QUANTITIES[quantity], parameters, at);
function failure(raw: string, quantity: QuantityName = "resistance"): SimError {
  try {
    value(raw, quantity);
  } catch (error) {
    if (isSimError(error)) return error;
    throw error;
  }
  throw new Error(`${raw} evaluated`);
}

describe("expressions over parameters", () => {
  it("evaluates the contract's examples", () => {
    expect(value("RB")).toBe(1e9);
    expect(value("RB*2")).toBe(2e9);
    // 1/(2π·1 kΩ·1 GΩ), computed independently
    expect(value("1/(2*pi*1k*RB)", "frequency")).toBeCloseTo(1 / (2 * Math.PI * 1e3 * 1e9), 25);
    expect(value("2n2*2", "capacitance")).toBeCloseTo(4.4e-9, 20);
    expect(value("10 uF * 2", "capacitance")).toBeCloseTo(20e-6, 18);
  });

  it("turns prefixed and RKM literals into numbers before mathjs (a trailing m is milli)", () => {
    expect(prepareExpression("2n2*2")).toBe("(2.2e-9)*2");
    expect(prepareExpression("1k*RB")).toBe("(1000)*RB");
    expect(prepareExpression("10m*2")).toBe("(0.01)*2");
    expect(prepareExpression("R1k*2")).toBe("R1k*2");
    expect(value("10m*2", "voltage")).toBeCloseTo(0.02, 15);
  });

  it("reads a mathjs unit after a space and checks it against the field", () => {
    expect(value("4.7 kΩ * 2")).toBe(9400);
    expect(value("3 m * 2", "length")).toBe(6);
    expect(failure("10 uF * 2").code).toBe("wrong_unit");
  });

  it("names an unknown parameter", () => {
    const error = failure("RBB*2");
    expect(error.code).toBe("unknown_parameter");
    expect(error.part).toBe("R1");
    expect(error.message).toContain("RBB");
    expect(error.message).toContain("RB, VPOL");
  });

  it("refuses the functions the mathjs security guidance disables, and anything but arithmetic", () => {
    for (const text of [
      "import({x: 1})",
      'createUnit("foo")',
      'evaluate("1")',
      'parse("1")',
      'simplify("x")',
      'derivative("x^2", "x")',
      "f(x) = x",
      "a = 3",
      "[1, 2]",
      '"text"',
      "RB > 1",
      "cos.constructor",
    ]) {
      const error = failure(text);
      expect(error.code, text).toBe("invalid_value");
    }
  });

  it("reports a non-real result instead of returning it", () => {
    expect(failure("sqrt(-1)").code).toBe("invalid_value");
  });

  it("never throws anything but SimError on random text (property)", () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.string({ maxLength: 40 }), fc.stringMatching(/^[0-9a-zA-Z*+/()^. µΩ-]{0,30}$/)),
        fc.constantFrom(...(Object.keys(QUANTITIES) as QuantityName[])),
        (text, quantity) => {
          try {
            const v = evaluateValue(text, QUANTITIES[quantity], parameters, at);
            expect(typeof v).toBe("number");
          } catch (error) {
            expect(error).toBeInstanceOf(SimError);
          }
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe("parameters", () => {
  it("evaluate in dependency order", () => {
    expect(evaluateParameters({ RB2: "RB*2", RB: "1G", C: "50p", F: "1/(2*pi*RB2*C)" })).toEqual({
      RB2: 2e9,
      RB: 1e9,
      C: 50e-12,
      F: 1 / (2 * Math.PI * 2e9 * 50e-12),
    });
    expect(evaluateParameters({ R: "1 GΩ", K: "47K" })).toEqual({ R: 1e9, K: 47e3 });
  });

  it("report a cycle naming the parameter", () => {
    try {
      evaluateParameters({ A: "B*2", B: "C+1", C: "A" });
      throw new Error("no cycle reported");
    } catch (error) {
      expect(error).toBeInstanceOf(SimError);
      const e = error as SimError;
      expect(e.message).toContain("parameters.A");
      expect(e.message).toContain("A → B → C → A");
    }
    expect(() => evaluateParameters({ A: "A+1" })).toThrow(/A → A/);
  });

  it("report an unknown name used by a parameter", () => {
    expect(() => evaluateParameters({ A: "NOPE*2" })).toThrow(SimError);
  });
});
