/**
 * A raw circuit file → an `ElaboratedCircuit`: validated, the variant applied (its parameters override the file's,
 * then `disable`, then `enable`), extra parameter overrides applied (sweeps), every value evaluated to an SI number,
 * every default filled, disabled parts dropped, nets listed.
 */
import { SimError } from "../errors";
import { elaborateAnalyses } from "./analyses";
import { evaluateValue } from "./evaluate-value";
import { KIND_SPECS, type NumericValueSpec } from "./kinds";
import { evaluateParameters } from "./parameters";
import { QUANTITIES } from "./quantities";
import { checkRange, pinchOffSignProblem } from "./ranges";
import { type CircuitFile, type CircuitPart, parseCircuitFile } from "./schema";
import { type ElaboratedCircuit, type ElaboratedPart, GROUND, type PartKind } from "./types";
import { parseTolerance } from "./values";

export interface ElaborateOptions {
  /** name of one of the file's variants */
  variant?: string;
  /** parameter overrides applied after the variant's (a sweep sets one this way) */
  parameters?: Record<string, number | string>;
}

function selectVariant(file: CircuitFile, name: string | undefined) {
  if (name === undefined) return undefined;
  const variant = file.variants.find((v) => v.name === name);
  if (!variant) {
    const names = file.variants.map((v) => `"${v.name}"`);
    const known = names.length > 0 ? `The file's variants are ${names.join(", ")}.` : "The file has no variants.";
    throw new SimError("unknown_variant", `There is no variant "${name}". ${known}`, { field: "variant" });
  }
  return variant;
}

/** Evaluates one numeric value of a part and checks its range. */
function numericValue(id: string, name: string, spec: NumericValueSpec, raw: unknown, scope: Record<string, number>) {
  const quantity = QUANTITIES[spec.quantity];
  const where = { part: id, field: name };
  const value = evaluateValue(raw, quantity, scope, where);
  checkRange(value, spec.range, quantity, raw, where);
  return value;
}

function elaboratePart(part: CircuitPart, scope: Record<string, number>): ElaboratedPart {
  const kind = part.kind as PartKind;
  const spec = KIND_SPECS[kind];
  const values: Record<string, number | string> = {};
  for (const [name, valueSpec] of Object.entries(spec.values)) {
    const given = Object.hasOwn(part.values, name);
    if (valueSpec.type === "choice") {
      values[name] = given ? (part.values[name] as string) : valueSpec.default;
    } else if (given) {
      values[name] = numericValue(part.id, name, valueSpec, part.values[name], scope);
    } else if (valueSpec.default !== undefined) {
      values[name] = valueSpec.default;
    }
  }
  if (kind === "jfet") {
    const problem = pinchOffSignProblem(
      part.id,
      values.type as string,
      values.pinch_off as number,
      part.values.pinch_off,
    );
    if (problem) throw new SimError("out_of_range", problem, { part: part.id, field: "pinch_off" });
  }
  const tolerance: Record<string, number> = {};
  for (const [name, raw] of Object.entries(part.tolerance)) {
    const parsed = parseTolerance(raw);
    if (parsed.kind === "value") tolerance[name] = parsed.value;
  }
  const elaborated: ElaboratedPart = {
    id: part.id,
    kind,
    pins: { ...part.pins },
    values,
    tolerance,
    toleranceDistribution: part.tolerance_distribution,
    noiseless: part.noiseless,
  };
  if (part.role !== undefined) elaborated.role = part.role;
  return elaborated;
}

/** Net names: ground first, then the others in code-point order (stable across runs and machines). */
function listNets(parts: readonly ElaboratedPart[]): string[] {
  const nets = new Set<string>();
  for (const part of parts) for (const net of Object.values(part.pins)) nets.add(net);
  nets.delete(GROUND);
  return [GROUND, ...[...nets].sort()];
}

export function elaborate(input: unknown, options: ElaborateOptions = {}): ElaboratedCircuit {
  const file = parseCircuitFile(input);
  const variant = selectVariant(file, options.variant);
  for (const name of Object.keys(options.parameters ?? {})) {
    if (!Object.hasOwn(file.parameters, name)) {
      throw new SimError(
        "unknown_parameter",
        `"${name}" is not a parameter of this file, so it cannot be overridden. Its parameters are ${Object.keys(file.parameters).join(", ") || "(none)"}.`,
        { field: `parameters.${name}` },
      );
    }
  }
  const definitions = { ...file.parameters, ...(variant?.parameters ?? {}), ...(options.parameters ?? {}) };
  const parameters = evaluateParameters(definitions);

  const enabled = new Map(file.parts.map((part) => [part.id, part.enabled]));
  for (const id of variant?.disable ?? []) enabled.set(id, false);
  for (const id of variant?.enable ?? []) enabled.set(id, true);

  const parts = file.parts.filter((part) => enabled.get(part.id)).map((part) => elaboratePart(part, parameters));
  const circuit: ElaboratedCircuit = {
    title: file.title,
    parameters,
    parts,
    output: { plus: file.output.plus, minus: file.output.minus },
    nets: listNets(parts),
    analyses: elaborateAnalyses(file.analyses, parameters),
    targets: file.targets.map((t) => ({ ...t })),
  };
  if (variant) circuit.variant = variant.name;
  return circuit;
}
