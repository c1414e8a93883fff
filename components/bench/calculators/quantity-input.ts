/**
 * Reading a calculator's input the way the engine reads a part's value ("25 µm", "1k2", "50p"), by borrowing the
 * value spec of a kind whose field has that quantity. Returns the SI number or the engine's message.
 */
import { parseFieldValue } from "@/sim/circuit/field";

const FIELD_OF_QUANTITY = {
  length: ["cable", "length"],
  resistance: ["resistor", "resistance"],
  capacitance: ["capacitor", "capacitance"],
  voltage: ["vsource", "dc"],
  current: ["isource", "dc"],
  number: ["vcvs", "gain"],
} as const;

export type CalculatorQuantity = keyof typeof FIELD_OF_QUANTITY;

export function readQuantity(
  text: string,
  quantity: CalculatorQuantity,
): { ok: true; value: number } | { ok: false; message: string } {
  const [kind, field] = FIELD_OF_QUANTITY[quantity];
  const result = parseFieldValue(kind, field, text.trim());
  if (!result.ok) return { ok: false, message: result.message.replace(/^[a-z]+\.\w+: /, "") };
  if (typeof result.value !== "number" || !Number.isFinite(result.value))
    return { ok: false, message: "give a finite number" };
  return { ok: true, value: result.value };
}

/** Runs a calculator over read inputs; any RangeError it throws becomes its message. */
export function calculate<T>(work: () => T): { ok: true; value: T } | { ok: false; message: string } {
  try {
    return { ok: true, value: work() };
  } catch (e) {
    return { ok: false, message: e instanceof Error ? e.message : String(e) };
  }
}
