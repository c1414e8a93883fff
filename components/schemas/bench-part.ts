/**
 * The part sheet's input: one zod schema per part, built from the engine's own field validation (sim's
 * `parseFieldValue` and kind table), so a value the form accepts is a value the solver accepts, with the engine's
 * message at the field otherwise. Values stay as typed ("4k7", "RB*2"); an empty optional value means "use the
 * contract's default". Pure zod, no React: shared by the form and its tests.
 */
import { z } from "zod";
import { parseFieldValue } from "@/sim/circuit/field";
import { KIND_SPECS } from "@/sim/circuit/kinds";
import { evaluateParameters } from "@/sim/circuit/parameters";
import { MAX_TOLERANCE, PARAMETER_NAME } from "@/sim/circuit/schema";
import type { PartKind } from "@/sim/circuit/types";
import { parseTolerance } from "@/sim/circuit/values";
import { isSimError } from "@/sim/errors";

export interface PartSheetContext {
  kind: PartKind;
  /** the part's current id (a rename to it is no change) */
  id: string;
  /** ids of the other parts */
  otherIds: readonly string[];
  parameters: Readonly<Record<string, number | string>>;
}

export function toleranceProblem(raw: string): string | null {
  const text = raw.trim();
  if (text === "") return null;
  const parsed = parseTolerance(text);
  if (parsed.kind === "invalid") return `"${text}" is not a tolerance. Write a percentage such as 5% or a fraction such as 0.05.`;
  if (parsed.value < 0 || parsed.value >= MAX_TOLERANCE) return "A tolerance is from 0 up to (not including) 100 %, such as 5%.";
  return null;
}

export function partSheetSchema(context: PartSheetContext) {
  const spec = KIND_SPECS[context.kind];
  const numeric = Object.entries(spec.values).filter(([, v]) => v.type === "number");
  const valueShape = Object.fromEntries(
    Object.entries(spec.values).map(([field, valueSpec]) => [
      field,
      z.string().superRefine((raw, ctx) => {
        const text = raw.trim();
        if (text === "") {
          if (valueSpec.type === "number" && valueSpec.required) {
            ctx.addIssue({ code: "custom", message: `${KIND_SPECS[context.kind].described} needs a ${field}.` });
          }
          return;
        }
        if (valueSpec.type === "choice") return;
        const result = parseFieldValue(context.kind, field, text, context.parameters, { part: context.id });
        if (!result.ok) ctx.addIssue({ code: "custom", message: result.message });
      }),
    ]),
  );
  const toleranceShape = Object.fromEntries(
    numeric.map(([field]) => [
      field,
      z.string().superRefine((raw, ctx) => {
        const problem = toleranceProblem(raw);
        if (problem) ctx.addIssue({ code: "custom", message: problem });
      }),
    ]),
  );
  return z
    .object({
      id: z
        .string()
        .trim()
        .min(1, { error: "Give the part an id, such as R1." })
        .max(40, { error: "Keep the id to 40 characters or fewer." })
        .refine((id) => id === context.id || !context.otherIds.includes(id), {
          error: "Another part already has this id. Choose an id no other part has.",
        }),
      values: z.object(valueShape),
      tolerance: z.object(toleranceShape),
      tolerance_distribution: z.enum(["uniform", "normal"]),
      enabled: z.boolean(),
      noiseless: z.boolean(),
      role: z.enum(["", "input", "supply"]),
      notes: z.string().max(2000, { error: "Keep notes to 2000 characters or fewer." }),
    })
    .superRefine((input, ctx) => {
      if (spec.atLeastOneOf && !spec.atLeastOneOf.some((f) => (input.values[f] ?? "").trim() !== "")) {
        ctx.addIssue({
          code: "custom",
          path: ["values", spec.atLeastOneOf[0]],
          message: `Give at least one of ${spec.atLeastOneOf.join(" or ")}.`,
        });
      }
    });
}

export type PartSheetInput = z.input<ReturnType<typeof partSheetSchema>>;

/** A parameter's name and value: a name expressions can use, a value that evaluates with the others. */
export function parameterSchema(parameters: Readonly<Record<string, number | string>>, editing?: string) {
  return z
    .object({
      name: z
        .string()
        .trim()
        .regex(PARAMETER_NAME, { error: "Use letters, digits and _, starting with a letter, such as RB or V_POL." })
        .refine((name) => name === editing || !Object.hasOwn(parameters, name), {
          error: "There is already a parameter with this name.",
        }),
      value: z.string().trim().min(1, { error: "Give the parameter a value, such as 1G or RB*2." }),
    })
    .superRefine((input, ctx) => {
      if (!PARAMETER_NAME.test(input.name)) return;
      const others = Object.fromEntries(Object.entries(parameters).filter(([n]) => n !== editing));
      try {
        evaluateParameters({ ...others, [input.name]: input.value });
      } catch (error) {
        if (!isSimError(error)) throw error;
        ctx.addIssue({ code: "custom", path: ["value"], message: error.message });
      }
    });
}
