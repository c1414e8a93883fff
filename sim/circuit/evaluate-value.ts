/**
 * One value from the file to one SI number: a JSON number, a parameter name, a literal (`4k7`, `4.7 kΩ`) or an
 * expression over the parameters. Every failure is a `SimError` naming where the value is and what to write instead.
 */
import { SimError } from "../errors";
import type { Unit } from "mathjs";
import { ExpressionError, evaluateExpression, parseExpression } from "./expressions";
import { type Quantity, QUANTITIES } from "./quantities";
import { restrictedMath } from "./restricted-math";
import { looksLikeLiteral, parseLiteral } from "./values";

/** Where a value sits, for messages: `R1.resistance`, `parameters.RB`, `analyses.ac.from`. */
export interface ValueLocation {
  part?: string;
  field: string;
  /** how the message names it; defaults to `part.field` */
  label?: string;
}

export function labelOf(where: ValueLocation): string {
  return where.label ?? (where.part ? `${where.part}.${where.field}` : where.field);
}

function errorAt(code: ConstructorParameters<typeof SimError>[0], where: ValueLocation, message: string): SimError {
  return new SimError(code, `${labelOf(where)}: ${message}`, { part: where.part, field: where.field });
}

function notAValue(raw: string, quantity: Quantity, where: ValueLocation): SimError {
  const how =
    quantity.units.length > 0
      ? `Write a number with an optional SI prefix and unit, such as ${quantity.examples}.`
      : `Write a number with an optional SI prefix, such as ${quantity.examples}.`;
  return errorAt("invalid_value", where, `"${raw}" is not a value. ${how}`);
}

function wrongUnit(raw: string, unitDescribed: string, quantity: Quantity, where: ValueLocation): SimError {
  if (quantity.units.length === 0) {
    return errorAt(
      "wrong_unit",
      where,
      `"${raw}" carries a unit (${unitDescribed}), but ${where.field} is a plain number. Write it without a unit, such as ${quantity.examples}.`,
    );
  }
  return errorAt(
    "wrong_unit",
    where,
    `"${raw}" is ${unitDescribed}, but ${where.field} takes ${quantity.described} in ${quantity.symbol}. Write it as, for example, ${quantity.examples}.`,
  );
}

function fromUnit(raw: string, unit: Unit, quantity: Quantity, where: ValueLocation): number {
  if (quantity.name === "any") {
    // a parameter has no quantity of its own: keep its SI value (angles in degrees, the unit of every phase field)
    const degrees = QUANTITIES.angle.mathjsUnit as string;
    return unit.equalBase(unitOf(degrees)) ? unit.toNumber(degrees) : unit.toSI().toNumber();
  }
  if (quantity.mathjsUnit === null || !unit.equalBase(unitOf(quantity.mathjsUnit))) {
    throw wrongUnit(raw, `in ${unit.formatUnits()}`, quantity, where);
  }
  return unit.toNumber(quantity.mathjsUnit);
}

const referenceUnits = new Map<string, Unit>();
/** The mathjs unit `1 <spelling>`, made once. */
function unitOf(spelling: string): Unit {
  let unit = referenceUnits.get(spelling);
  if (!unit) {
    unit = restrictedMath.unit(`1 ${spelling}`);
    referenceUnits.set(spelling, unit);
  }
  return unit;
}

/**
 * Evaluates one value to an SI number (possibly ±Infinity; the caller checks the range). `parameters` are the
 * evaluated parameters in scope.
 */
export function evaluateValue(
  raw: unknown,
  quantity: Quantity,
  parameters: Readonly<Record<string, number>>,
  where: ValueLocation,
): number {
  if (typeof raw === "number") {
    if (!Number.isFinite(raw)) throw errorAt("invalid_value", where, `${raw} is not a finite number.`);
    return raw;
  }
  if (typeof raw !== "string") {
    throw errorAt("invalid_value", where, `a value is a number or a string, such as ${quantity.examples}.`);
  }
  const text = raw.trim();
  if (text === "")
    throw errorAt("invalid_value", where, `the value is empty. Write a value, such as ${quantity.examples}.`);
  if (Object.hasOwn(parameters, text)) return parameters[text];

  const literal = parseLiteral(text, quantity);
  if (literal.kind === "value") return literal.value;
  if (literal.kind === "wrong_unit") {
    throw wrongUnit(raw, `${literal.unitQuantity.described} (${literal.unitQuantity.symbol})`, quantity, where);
  }

  const names = new Set(Object.keys(parameters));
  try {
    const value = evaluateExpression(parseExpression(text, names), parameters);
    return value.kind === "number" ? value.value : fromUnit(raw, value.unit, quantity, where);
  } catch (error) {
    if (!(error instanceof ExpressionError)) throw error;
    if (looksLikeLiteral(text)) throw notAValue(raw, quantity, where);
    if (error.reason === "unknown_symbol") {
      const known = [...names].sort();
      const listed = known.length > 0 ? ` (parameters: ${known.join(", ")})` : " (the file has no parameters)";
      const lone = error.symbol === text;
      const opening = lone
        ? `"${raw}" is neither a value nor a parameter of this file${listed}.`
        : `"${raw}" ${error.message} of this file${listed}.`;
      throw errorAt(
        "unknown_parameter",
        where,
        `${opening} Define ${error.symbol} under "parameters", correct the name, or write a value such as ${quantity.examples}.`,
      );
    }
    throw errorAt(
      "invalid_value",
      where,
      `"${raw}" ${error.message}. Write a value such as ${quantity.examples}, or an expression over the parameters such as RB*2.`,
    );
  }
}
