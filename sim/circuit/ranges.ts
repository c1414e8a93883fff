/** Range checks for evaluated values, with messages that say what the field accepts. */
import { SimError } from "../errors";
import { labelOf, type ValueLocation } from "./evaluate-value";
import type { NumericRange } from "./kinds";
import type { Quantity } from "./quantities";

function describeRange(range: NumericRange, quantity: Quantity): string {
  const unit = quantity.symbol ? ` ${quantity.symbol}` : "";
  const parts: string[] = [];
  if (range.integer) parts.push("a whole number");
  if (range.min !== undefined) parts.push(`${range.minExclusive ? "greater than" : "at least"} ${range.min}${unit}`);
  if (range.max !== undefined) parts.push(`at most ${range.max}${unit}`);
  if (parts.length === 0) parts.push("a finite number");
  return parts.join(", ");
}

function shown(raw: unknown, value: number): string {
  return typeof raw === "string" && raw.trim() !== String(value) ? `"${raw}" (= ${value})` : String(value);
}

/** Throws `out_of_range` (or `invalid_value` for NaN) unless `value` lies in `range`. */
export function checkRange(
  value: number,
  range: NumericRange,
  quantity: Quantity,
  raw: unknown,
  where: ValueLocation,
  code: "out_of_range" | "invalid_analysis" = "out_of_range",
): void {
  const label = labelOf(where);
  const fail = (why: string) =>
    new SimError(code, `${label}: ${shown(raw, value)} is out of range: ${why}`, {
      part: where.part,
      field: where.field,
    });
  if (Number.isNaN(value)) {
    throw new SimError(code === "out_of_range" ? "invalid_value" : code, `${label}: "${raw}" does not give a number.`, {
      part: where.part,
      field: where.field,
    });
  }
  const accepted = `${where.field} must be ${describeRange(range, quantity)}.`;
  if (!Number.isFinite(value) && !range.allowInfinite) throw fail(`${accepted} An infinite value is not allowed here.`);
  if (range.integer && Number.isFinite(value) && !Number.isInteger(value)) throw fail(accepted);
  if (range.min !== undefined && (range.minExclusive ? value <= range.min : value < range.min)) throw fail(accepted);
  if (range.max !== undefined && value > range.max) throw fail(accepted);
}

/**
 * A JFET's pinch-off sign follows its channel: negative for n, positive for p. Returns the message when it does
 * not, else undefined.
 */
export function pinchOffSignProblem(id: string, type: string, pinchOff: number, raw: unknown): string | undefined {
  if (type === "p" ? pinchOff > 0 : pinchOff < 0) return undefined;
  const pChannel = type === "p";
  return `${id}.pinch_off: ${JSON.stringify(raw)} does not suit ${pChannel ? "a p-channel" : "an n-channel"} JFET, whose pinch-off voltage is ${pChannel ? "positive (such as 2 V)" : "negative (such as -2 V)"}. Change the sign, or set type to "${pChannel ? "n" : "p"}".`;
}
