/**
 * The zod schema of a Backplate circuit file (version 1) and the checks the contract's kind table implies: known
 * kinds, every pin and only known pins, known value names, required values, unique ids, variants naming real parts
 * and parameters. Values themselves (syntax, unit, range) are evaluated by elaborate.ts, because they depend on the
 * parameters a variant or a sweep sets. Each problem becomes a `SimError` with the contract's code.
 */
import { z } from "zod";
import { SimError, type SimErrorCode } from "../errors";
import { isPartKind, KIND_SPECS } from "./kinds";
import { PART_KINDS } from "./types";
import { parseTolerance } from "./values";

export const CIRCUIT_FORMAT = "backplate/circuit";
export const CIRCUIT_VERSION = 1;

/** A parameter name is an identifier, so that expressions can use it. */
export const PARAMETER_NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** What a custom issue carries so that it maps to a `SimError`. */
interface SimIssueParams {
  simCode: SimErrorCode;
  part?: string;
  net?: string;
  field?: string;
}

type Ctx = z.RefinementCtx;

function report(ctx: Ctx, path: (string | number)[], message: string, params: SimIssueParams): void {
  ctx.addIssue({ code: "custom", message, path, params: { ...params } });
}

const expected = (what: string) => ({
  error: (issue: { input: unknown }) => (issue.input === undefined ? `is missing: ${what}` : `must be ${what}`),
});

/** A value as written in a file: a JSON number or a string (a literal, a parameter name or an expression). */
export const valueInputSchema = z.union([z.number(), z.string()], expected("a number or a string, such as 4.7k"));
const netNameSchema = z.string(expected('a net name (a non-empty string, "0" for ground)')).min(1, {
  error: 'must be a net name (a non-empty string, "0" for ground)',
});

const partObject = z.looseObject({
  id: z.string(expected("a part id such as R1")).min(1, { error: "must be a part id such as R1" }),
  kind: z.string(expected(`a kind: ${PART_KINDS.join(", ")}`)),
  pins: z.record(z.string(), netNameSchema, expected("an object mapping each pin to a net")),
  values: z.record(z.string(), valueInputSchema, expected("an object of values")).default({}),
  enabled: z.boolean(expected("true or false")).default(true),
  tolerance: z.record(z.string(), valueInputSchema, expected('an object such as { "resistance": "5%" }')).default({}),
  tolerance_distribution: z.enum(["uniform", "normal"], expected('"uniform" or "normal"')).default("uniform"),
  noiseless: z.boolean(expected("true or false")).default(false),
  role: z.enum(["input", "supply"], expected('"input" or "supply"')).optional(),
});

export type CircuitPart = z.output<typeof partObject>;

/** Tolerances are relative: 0 ≤ t < 1 (a 100 % tolerance could reach zero). */
export const MAX_TOLERANCE = 1;

function checkPartAgainstKind(part: CircuitPart, ctx: Ctx): void {
  const id = part.id;
  if (!isPartKind(part.kind)) {
    report(ctx, ["kind"], `${id}: "${part.kind}" is not a kind of part. Use one of: ${PART_KINDS.join(", ")}.`, {
      simCode: "unknown_kind",
      part: id,
      field: "kind",
    });
    return;
  }
  const spec = KIND_SPECS[part.kind];
  for (const pin of Object.keys(part.pins)) {
    if (!spec.pins.includes(pin)) {
      report(
        ctx,
        ["pins", pin],
        `${id}.pins.${pin}: ${spec.described} has no pin "${pin}". Its pins are ${spec.pins.join(", ")}.`,
        { simCode: "unknown_pin", part: id, field: `pins.${pin}` },
      );
    }
  }
  for (const pin of spec.pins) {
    if (!Object.hasOwn(part.pins, pin)) {
      report(
        ctx,
        ["pins"],
        `${id}: pin ${pin} is not connected. Connect every pin of ${spec.described} (${spec.pins.join(", ")}) to a net, such as "${pin}": "0".`,
        { simCode: "missing_pin", part: id, field: `pins.${pin}` },
      );
    }
  }
  const valueNames = Object.keys(spec.values);
  for (const [name, raw] of Object.entries(part.values)) {
    const valueSpec = Object.hasOwn(spec.values, name) ? spec.values[name] : undefined;
    if (!valueSpec) {
      report(
        ctx,
        ["values", name],
        `${id}.${name}: ${spec.described} has no value "${name}". Its values are ${valueNames.join(", ")}.`,
        { simCode: "invalid_value", part: id, field: name },
      );
    } else if (valueSpec.type === "choice" && (typeof raw !== "string" || !valueSpec.choices.includes(raw))) {
      report(
        ctx,
        ["values", name],
        `${id}.${name}: ${JSON.stringify(raw)} is not a ${name}. Use ${valueSpec.choices.map((c) => `"${c}"`).join(" or ")}.`,
        { simCode: "invalid_value", part: id, field: name },
      );
    }
  }
  for (const [name, valueSpec] of Object.entries(spec.values)) {
    if (valueSpec.type === "number" && valueSpec.required && !Object.hasOwn(part.values, name)) {
      report(ctx, ["values"], `${id}.${name}: ${spec.described} needs a ${name}. Add "${name}" to its values.`, {
        simCode: "invalid_value",
        part: id,
        field: name,
      });
    }
  }
  if (spec.atLeastOneOf && !spec.atLeastOneOf.some((name) => Object.hasOwn(part.values, name))) {
    report(
      ctx,
      ["values"],
      `${id}: ${spec.described} needs at least one of ${spec.atLeastOneOf.join(" or ")}, such as "resistance": "1k2".`,
      { simCode: "invalid_value", part: id, field: spec.atLeastOneOf[0] },
    );
  }
  if (part.role !== undefined && !spec.takesRole) {
    report(
      ctx,
      ["role"],
      `${id}.role: only voltage and current sources take a role; remove it from ${spec.described}.`,
      {
        simCode: "invalid_value",
        part: id,
        field: "role",
      },
    );
  }
  for (const [name, raw] of Object.entries(part.tolerance)) {
    const valueSpec = Object.hasOwn(spec.values, name) ? spec.values[name] : undefined;
    const field = `tolerance.${name}`;
    if (valueSpec?.type !== "number") {
      report(ctx, ["tolerance", name], `${id}.${field}: ${spec.described} has no numeric value "${name}" to vary.`, {
        simCode: "invalid_value",
        part: id,
        field,
      });
      continue;
    }
    const tolerance = parseTolerance(raw);
    if (tolerance.kind === "invalid") {
      report(
        ctx,
        ["tolerance", name],
        `${id}.${field}: "${raw}" is not a tolerance. Write a percentage such as "5%" or a fraction such as 0.05.`,
        {
          simCode: "invalid_value",
          part: id,
          field,
        },
      );
    } else if (tolerance.value < 0 || tolerance.value >= MAX_TOLERANCE) {
      report(
        ctx,
        ["tolerance", name],
        `${id}.${field}: ${raw} is out of range. A tolerance is from 0 up to (not including) 100 %, such as "5%".`,
        {
          simCode: "out_of_range",
          part: id,
          field,
        },
      );
    }
  }
}

const partSchema = partObject.superRefine(checkPartAgainstKind);

const variantSchema = z.looseObject({
  name: z.string(expected("a variant name")).min(1, { error: "must be a variant name" }),
  parameters: z.record(z.string(), valueInputSchema, expected("an object of parameter values")).default({}),
  disable: z.array(z.string(), expected("a list of part ids")).default([]),
  enable: z.array(z.string(), expected("a list of part ids")).default([]),
});

const frequencyFields = {
  from: valueInputSchema.optional(),
  to: valueInputSchema.optional(),
  points_per_decade: valueInputSchema.optional(),
  frequencies: z.array(valueInputSchema, expected("a list of frequencies in Hz")).min(1).optional(),
  temperature: valueInputSchema.optional(),
};

const analysesSchema = z.strictObject(
  {
    op: z.looseObject({ temperature: valueInputSchema.optional() }, expected("an object, such as {}")).optional(),
    ac: z.looseObject({ ...frequencyFields, pressure: valueInputSchema.optional() }, expected("an object")).optional(),
    noise: z.looseObject(frequencyFields, expected("an object")).optional(),
    sweep: z
      .looseObject(
        {
          parameter: z.string(expected("the name of a parameter")),
          values: z
            .array(valueInputSchema, expected("a list of values"))
            .min(1, { error: "must list at least one value" }),
        },
        expected("an object { parameter, values }"),
      )
      .optional(),
    spread: z
      .looseObject(
        {
          runs: z.number(expected("a whole number of runs")).int().min(1).max(100_000),
          seed: z.number(expected("a whole number")).int().default(1),
        },
        expected("an object { runs, seed }"),
      )
      .optional(),
    transient: z.record(z.string(), z.unknown(), expected("an object")).optional(),
    distortion: z.record(z.string(), z.unknown(), expected("an object")).optional(),
    ripple: z.record(z.string(), z.unknown(), expected("an object")).optional(),
  },
  expected('an object of analyses, such as { "op": {}, "ac": {} }'),
);

const targetSchema = z.looseObject({
  figure: z.string(expected("a figure name such as low_corner_hz")).min(1),
  min: z.number(expected("a number")).optional(),
  max: z.number(expected("a number")).optional(),
  variant: z.string(expected("a variant name")).optional(),
});

const fileObject = z.looseObject(
  {
    format: z.literal(CIRCUIT_FORMAT, expected(`"${CIRCUIT_FORMAT}"`)),
    version: z.literal(CIRCUIT_VERSION, expected(`${CIRCUIT_VERSION} (this engine reads version 1 files)`)),
    title: z.string(expected("a string")).default(""),
    parameters: z.record(z.string(), valueInputSchema, expected("an object of parameter values")).default({}),
    parts: z.array(partSchema, expected("a list of parts")),
    output: z.looseObject({ plus: netNameSchema, minus: netNameSchema }, expected('{ "plus": NET, "minus": NET }')),
    variants: z.array(variantSchema, expected("a list of variants")).default([]),
    analyses: analysesSchema.optional(),
    targets: z.array(targetSchema, expected("a list of targets")).default([]),
  },
  expected("a JSON object (a Backplate circuit file)"),
);

type FileOutput = z.output<typeof fileObject>;

function checkFileConsistency(file: FileOutput, ctx: Ctx): void {
  const ids = new Set<string>();
  file.parts.forEach((part, index) => {
    if (ids.has(part.id)) {
      report(ctx, ["parts", index, "id"], `${part.id}: two parts have the id ${part.id}. Give each part its own id.`, {
        simCode: "duplicate_id",
        part: part.id,
        field: "id",
      });
    }
    ids.add(part.id);
  });
  for (const name of Object.keys(file.parameters)) {
    if (!PARAMETER_NAME.test(name)) {
      report(
        ctx,
        ["parameters", name],
        `parameters.${name}: "${name}" cannot be a parameter name. Use letters, digits and _, starting with a letter, such as RB or V_POL.`,
        {
          simCode: "invalid_value",
          field: `parameters.${name}`,
        },
      );
    }
  }
  const variantNames = new Set<string>();
  file.variants.forEach((variant, index) => {
    const where = `variants.${variant.name}`;
    if (variantNames.has(variant.name)) {
      report(
        ctx,
        ["variants", index, "name"],
        `${where}: two variants are called "${variant.name}". Give each its own name.`,
        {
          simCode: "invalid_file",
          field: "name",
        },
      );
    }
    variantNames.add(variant.name);
    for (const name of Object.keys(variant.parameters)) {
      if (!Object.hasOwn(file.parameters, name)) {
        report(
          ctx,
          ["variants", index, "parameters", name],
          `${where}: sets parameter ${name}, which the file does not define. Add ${name} to "parameters" or correct the name.`,
          {
            simCode: "unknown_parameter",
            field: `parameters.${name}`,
          },
        );
      }
    }
    for (const list of ["disable", "enable"] as const) {
      variant[list].forEach((id, position) => {
        if (!ids.has(id)) {
          report(
            ctx,
            ["variants", index, list, position],
            `${where}.${list}: there is no part ${id}. List the ids of parts in this file.`,
            {
              simCode: "unknown_part",
              part: id,
              field: list,
            },
          );
        }
      });
    }
  });
  const sweep = file.analyses?.sweep;
  if (sweep && !Object.hasOwn(file.parameters, sweep.parameter)) {
    report(
      ctx,
      ["analyses", "sweep", "parameter"],
      `analyses.sweep.parameter: "${sweep.parameter}" is not a parameter of this file. Sweep one of: ${Object.keys(file.parameters).join(", ") || "(define a parameter first)"}.`,
      {
        simCode: "unknown_parameter",
        field: "analyses.sweep.parameter",
      },
    );
  }
  file.targets.forEach((target, index) => {
    if (target.variant !== undefined && !variantNames.has(target.variant)) {
      report(
        ctx,
        ["targets", index, "variant"],
        `targets[${index}].variant: there is no variant "${target.variant}".`,
        {
          simCode: "unknown_variant",
          field: "variant",
        },
      );
    }
  });
}

/** The whole file. Parse with `parseCircuitFile` to get `SimError`s; the raw schema is exported for forms. */
export const circuitFileSchema = fileObject.superRefine(checkFileConsistency);

export type CircuitFile = z.output<typeof circuitFileSchema>;

function pathLabel(path: readonly PropertyKey[], input: unknown): { label: string; part?: string; field?: string } {
  if (path[0] === "parts" && typeof path[1] === "number") {
    const raw = (input as { parts?: unknown[] })?.parts?.[path[1]] as { id?: unknown } | undefined;
    const part = typeof raw?.id === "string" && raw.id !== "" ? raw.id : undefined;
    const rest = path.slice(2).map(String);
    const head = part ?? `parts[${path[1]}]`;
    if (rest[0] === "values" && rest.length > 1)
      return { label: `${head}.${rest.slice(1).join(".")}`, part, field: rest[1] };
    return { label: [head, ...rest].join("."), part, field: rest.join(".") || undefined };
  }
  const label = path
    .map((key) => (typeof key === "number" ? `[${key}]` : `.${String(key)}`))
    .join("")
    .replace(/^\./, "");
  return { label: label || "file", field: label || undefined };
}

function codeForPath(path: readonly PropertyKey[]): SimErrorCode {
  if (path[0] === "analyses") return "invalid_analysis";
  if (path[0] === "parts" && path[2] === "values") return "invalid_value";
  if (path[0] === "parts" && path[2] === "kind") return "unknown_kind";
  return "invalid_file";
}

/** One zod issue → one `SimError`. */
export function issueToSimError(issue: z.core.$ZodIssue, input: unknown): SimError {
  const params = (issue as { params?: SimIssueParams }).params;
  if (issue.code === "custom" && params?.simCode) {
    return new SimError(params.simCode, issue.message, { part: params.part, net: params.net, field: params.field });
  }
  const where = pathLabel(issue.path, input);
  let message = issue.message;
  if (issue.code === "unrecognized_keys") {
    const keys = (issue as { keys: string[] }).keys;
    message = `has no ${keys.map((k) => `"${k}"`).join(", ")}; the analyses are op, ac, noise, sweep, spread, transient, distortion and ripple`;
  }
  return new SimError(codeForPath(issue.path), `${where.label}: ${message}.`, { part: where.part, field: where.field });
}

export type FileValidation = { ok: true; file: CircuitFile } | { ok: false; errors: SimError[] };

/**
 * Longest lists a file may hold. A microphone front end has tens of parts; the limits are far above any real
 * design and keep a hostile or broken file from costing seconds (the schema would report every bad entry).
 */
export const LIST_LIMITS = { parts: 2000, variants: 200, targets: 200 } as const;

/** The first list in `input` longer than its limit, as the error that says so, before any entry is checked. */
function tooLongList(input: unknown): SimError | undefined {
  if (input === null || typeof input !== "object") return undefined;
  for (const [field, limit] of Object.entries(LIST_LIMITS)) {
    const list = (input as Record<string, unknown>)[field];
    if (Array.isArray(list) && list.length > limit) {
      return new SimError(
        "invalid_file",
        `${field}: has ${list.length} entries; a file may hold at most ${limit}. Remove some, or split the design.`,
        { field },
      );
    }
  }
  return undefined;
}

/** Validates a parsed JSON value against the contract; every problem found, in file order. */
export function validateCircuitFile(input: unknown): FileValidation {
  const tooLong = tooLongList(input);
  if (tooLong) return { ok: false, errors: [tooLong] };
  const result = circuitFileSchema.safeParse(input);
  if (result.success) return { ok: true, file: result.data };
  return { ok: false, errors: result.error.issues.map((issue) => issueToSimError(issue, input)) };
}

/** Validates and returns the file with defaults filled; throws the first problem as a `SimError`. */
export function parseCircuitFile(input: unknown): CircuitFile {
  const result = validateCircuitFile(input);
  if (!result.ok) throw result.errors[0];
  return result.file;
}
