import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isSimError } from "../errors";
import { evaluateValue } from "./evaluate-value";
import { QUANTITIES, type QuantityName } from "./quantities";
import { parseLiteral, parseTolerance, SI_PREFIXES } from "./values";

const at = { part: "X1", field: "value" };
function value(raw: unknown, quantity: QuantityName, parameters: Record<string, number> = {}): number {
  return evaluateValue(raw, QUANTITIES[quantity], parameters, at);
}
function failure(raw: unknown, quantity: QuantityName, parameters: Record<string, number> = {}) {
  try {
    value(raw, quantity, parameters);
  } catch (error) {
    if (isSimError(error)) return error;
    throw error;
  }
  throw new Error(`${String(raw)} parsed`);
}

describe("IEC 60062 RKM codes (values from the standard's examples)", () => {
  // IEC 60062: the letter stands for the decimal point and the multiplier.
  it.each([
    ["R47", "resistance", 0.47],
    ["4R7", "resistance", 4.7],
    ["4k7", "resistance", 4700],
    ["4K7", "resistance", 4700],
    ["47K3", "resistance", 47_300],
    ["4M7", "resistance", 4.7e6],
    ["6M8", "resistance", 6.8e6],
    ["1G0", "resistance", 1e9],
    ["47R", "resistance", 47],
    ["4p7", "capacitance", 4.7e-12],
    ["2n2", "capacitance", 2.2e-9],
    ["4µ7", "capacitance", 4.7e-6],
    ["4u7", "capacitance", 4.7e-6],
    ["1m5", "inductance", 1.5e-3],
  ] as const)("%s is %d", (raw, quantity, expected) => {
    expect(value(raw, quantity)).toBe(expected);
  });

  it("accepts an unprefixed unit after a code", () => {
    expect(value("4k7 Ω", "resistance")).toBe(4700);
    expect(value("2n2F", "capacitance")).toBe(2.2e-9);
  });
});

describe("SI prefixes and units", () => {
  it.each([
    ["1e-9", "capacitance", 1e-9],
    ["2.2u", "capacitance", 2.2e-6],
    ["2.2µ", "capacitance", 2.2e-6],
    ["2.2μ", "capacitance", 2.2e-6],
    ["47k", "resistance", 47e3],
    ["1G", "resistance", 1e9],
    ["100meg", "resistance", 1e8],
    ["100Meg", "resistance", 1e8],
    ["1M", "resistance", 1e6],
    ["1m", "resistance", 1e-3],
    ["3f", "capacitance", 3e-15],
    ["2T", "resistance", 2e12],
    ["50 pF", "capacitance", 50e-12],
    ["4.7 kΩ", "resistance", 4700],
    ["4.7 kΩ", "resistance", 4700], // U+2126 OHM SIGN
    ["100 MΩ", "resistance", 1e8],
    ["1 GOhm", "resistance", 1e9],
    ["10 kohm", "resistance", 1e4],
    ["3 mA", "current", 3e-3],
    ["60 V", "voltage", 60],
    ["-2 V", "voltage", -2],
    ["10 mH", "inductance", 10e-3],
    ["3 m", "length", 3],
    ["1 kHz", "frequency", 1000],
    ["300 K", "temperature", 300],
    ["300K", "temperature", 300],
    ["1.5 mA/V^1.5", "perveance", 1.5e-3],
    ["2 mS", "conductance", 2e-3],
    ["2 mA/V", "conductance", 2e-3],
    ["2 nV/√Hz", "voltage_noise_density", 2e-9],
    ["100 pF/m", "capacitance_per_length", 100e-12],
    ["50 mΩ/m", "resistance_per_length", 0.05],
    ["2e-4 1/Pa", "per_pressure", 2e-4],
    ["90°", "angle", 90],
    ["10 V/V", "gain", 10],
    [42, "resistance", 42],
  ] as const)("%s is %d", (raw, quantity, expected) => {
    expect(value(raw, quantity)).toBeCloseTo(expected, 15);
    expect(value(raw, quantity) / expected).toBeCloseTo(1, 12);
  });

  it("reads a trailing m as milli, and as metres only after a space in a length", () => {
    expect(value("3m", "length")).toBe(3e-3);
    expect(value("3 m", "length")).toBe(3);
    expect(value("3 mm", "length")).toBe(3e-3);
    expect(value("5m", "voltage")).toBe(5e-3);
  });

  it("reports a unit of another quantity as wrong_unit naming the part and field", () => {
    const error = failure("50 pH", "capacitance");
    expect(error.code).toBe("wrong_unit");
    expect(error.part).toBe("X1");
    expect(error.field).toBe("value");
    expect(error.message).toContain("X1.value");
    expect(error.message).toMatch(/inductance/);
    expect(error.message).toMatch(/capacitance in F/);
    expect(failure("3 mA", "voltage").code).toBe("wrong_unit");
    expect(failure("100 V", "dimensionless").code).toBe("wrong_unit");
  });

  it("says how to write a value that does not parse", () => {
    const error = failure("4k7x", "resistance");
    expect(error.code).toBe("invalid_value");
    expect(error.message).toBe(
      'X1.value: "4k7x" is not a value. Write a number with an optional SI prefix and unit, such as 4k7, 4.7k or 4.7 kΩ.',
    );
    expect(failure("", "resistance").code).toBe("invalid_value");
    expect(failure(true, "resistance").code).toBe("invalid_value");
  });

  it("recognises infinite as a literal (the range check decides whether it is allowed)", () => {
    expect(value("inf", "resistance")).toBe(Infinity);
    expect(value("-Infinity", "voltage")).toBe(-Infinity);
  });

  it("round-trips random numbers written with any prefix (property)", () => {
    const prefixes = SI_PREFIXES.map(([prefix, exponent]) => ({ prefix, exponent }));
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.constantFrom(...prefixes),
        fc.boolean(),
        (mantissa, { prefix, exponent }, withUnit) => {
          const text = `${mantissa}${withUnit ? ` ${prefix}F` : prefix}`;
          const parsed = value(text, "capacitance");
          const expected = Number(`${mantissa}e${exponent}`);
          expect(parsed / expected).toBeCloseTo(1, 12);
        },
      ),
    );
  });
});

describe("tolerances", () => {
  it('reads "5%" and 0.05 alike', () => {
    expect(parseTolerance("5%")).toEqual({ kind: "value", value: 0.05 });
    expect(parseTolerance(0.05)).toEqual({ kind: "value", value: 0.05 });
    expect(parseTolerance("0.1")).toEqual({ kind: "value", value: 0.1 });
    expect(parseTolerance("five")).toEqual({ kind: "invalid" });
  });
});

describe("parseLiteral", () => {
  it("leaves expressions for the expression evaluator", () => {
    expect(parseLiteral("RB*2", QUANTITIES.resistance).kind).toBe("not_literal");
    expect(parseLiteral("2n2*2", QUANTITIES.capacitance).kind).toBe("not_literal");
  });

  it("never throws on random text (property)", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 30 }), fc.constantFrom(...Object.values(QUANTITIES)), (text, quantity) => {
        expect(["value", "wrong_unit", "not_literal"]).toContain(parseLiteral(text, quantity).kind);
      }),
    );
  });
});
