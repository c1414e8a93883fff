/**
 * One field on its own, for the part sheet's forms: `parseFieldValue("resistor", "resistance", "4k7", params)`.
 * Same parsing, units and ranges as `elaborate`, with the message a person can act on instead of an exception.
 */
import { z } from "zod";
import { isSimError, type SimErrorCode } from "../errors";
import { evaluateValue } from "./evaluate-value";
import { isPartKind, KIND_SPECS } from "./kinds";
import { evaluateParameters } from "./parameters";
import { QUANTITIES } from "./quantities";
import { checkRange, pinchOffSignProblem } from "./ranges";
import { valueInputSchema } from "./schema";
import type { PartKind } from "./types";

export type FieldResult = { ok: true; value: number | string } | { ok: false; message: string; code: SimErrorCode };

export interface FieldOptions {
  /** the part's id, for messages (defaults to the kind) */
  part?: string;
  /** a JFET's channel type, to check the pinch-off sign */
  type?: string;
}

/**
 * Parses one value of a part of `kind`: the SI number (or, for a JFET's or BJT's `type`, the choice), or a message.
 * `parameters` are the file's parameter definitions (raw, as in the file).
 */
export function parseFieldValue(
  kind: PartKind | string,
  field: string,
  raw: unknown,
  parameters: Readonly<Record<string, number | string>> = {},
  options: FieldOptions = {},
): FieldResult {
  const part = options.part ?? kind;
  if (!isPartKind(kind)) return { ok: false, code: "unknown_kind", message: `"${kind}" is not a kind of part.` };
  const spec = KIND_SPECS[kind];
  const valueSpec = Object.hasOwn(spec.values, field) ? spec.values[field] : undefined;
  if (!valueSpec) {
    return {
      ok: false,
      code: "invalid_value",
      message: `${part}.${field}: ${spec.described} has no value "${field}". Its values are ${Object.keys(spec.values).join(", ")}.`,
    };
  }
  if (valueSpec.type === "choice") {
    return typeof raw === "string" && valueSpec.choices.includes(raw)
      ? { ok: true, value: raw }
      : {
          ok: false,
          code: "invalid_value",
          message: `${part}.${field}: use ${valueSpec.choices.map((c) => `"${c}"`).join(" or ")}.`,
        };
  }
  try {
    const scope = evaluateParameters(parameters);
    const quantity = QUANTITIES[valueSpec.quantity];
    const where = { part, field };
    const value = evaluateValue(raw, quantity, scope, where);
    checkRange(value, valueSpec.range, quantity, raw, where);
    const problem =
      kind === "jfet" && field === "pinch_off" && pinchOffSignProblem(part, options.type ?? "n", value, raw);
    if (problem) return { ok: false, code: "out_of_range", message: problem };
    return { ok: true, value };
  } catch (error) {
    if (isSimError(error)) return { ok: false, code: error.code, message: error.message };
    throw error;
  }
}

/**
 * A zod schema for one part's `values` (for react-hook-form's zod resolver on the part sheet): each value is
 * checked with `parseFieldValue`, and each problem is reported on its own field.
 */
export function partValuesSchema(
  kind: PartKind,
  parameters: Readonly<Record<string, number | string>> = {},
  options: FieldOptions = {},
) {
  return z.record(z.string(), valueInputSchema).superRefine((values, ctx) => {
    for (const [field, raw] of Object.entries(values)) {
      const type = typeof values.type === "string" ? values.type : options.type;
      const result = parseFieldValue(kind, field, raw, parameters, { ...options, type });
      if (!result.ok)
        ctx.addIssue({ code: "custom", path: [field], message: result.message, params: { simCode: result.code } });
    }
  });
}
