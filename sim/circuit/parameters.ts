/**
 * Parameters evaluate in dependency order: `"RB": "1G"`, `"RB2": "RB*2"`. A cycle (`A` uses `B`, `B` uses `A`) is an
 * error naming the parameter and the chain.
 */
import { SimError } from "../errors";
import { evaluateValue } from "./evaluate-value";
import { ExpressionError, parseExpression } from "./expressions";
import { QUANTITIES } from "./quantities";
import { parseLiteral } from "./values";

export type ParameterDefinitions = Readonly<Record<string, number | string>>;

/** The parameter names a definition reads; empty for a number or a literal. Unparseable text reads nothing here. */
function dependenciesOf(raw: number | string, names: ReadonlySet<string>): string[] {
  if (typeof raw === "number") return [];
  const text = raw.trim();
  if (names.has(text)) return [text];
  if (parseLiteral(text, QUANTITIES.any).kind !== "not_literal") return [];
  try {
    return parseExpression(text, names).parameters;
  } catch (error) {
    if (error instanceof ExpressionError) return [];
    throw error;
  }
}

/** Evaluates every parameter to an SI number. Throws `SimError` (a bad value, an unknown name, a cycle). */
export function evaluateParameters(definitions: ParameterDefinitions): Record<string, number> {
  const names = new Set(Object.keys(definitions));
  const values: Record<string, number> = {};
  const state = new Map<string, "visiting" | "done">();

  const visit = (name: string, chain: string[]): void => {
    if (state.get(name) === "done") return;
    if (state.get(name) === "visiting") {
      const cycle = [...chain.slice(chain.indexOf(name)), name].join(" → ");
      throw new SimError(
        "invalid_value",
        `parameters.${name}: the parameters depend on each other in a circle (${cycle}). Give one of them a value that does not use the others.`,
        { field: `parameters.${name}` },
      );
    }
    state.set(name, "visiting");
    const raw = definitions[name];
    for (const dependency of dependenciesOf(raw, names)) visit(dependency, [...chain, name]);
    const value = evaluateValue(raw, QUANTITIES.any, values, { field: `parameters.${name}` });
    if (Number.isNaN(value)) {
      throw new SimError("invalid_value", `parameters.${name}: "${raw}" does not give a number.`, {
        field: `parameters.${name}`,
      });
    }
    values[name] = value;
    state.set(name, "done");
  };

  for (const name of names) visit(name, []);
  return values;
}
