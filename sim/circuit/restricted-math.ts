/**
 * The one mathjs instance the engine evaluates circuit-file expressions with. Following the mathjs security
 * guidance, the functions that change the instance (`import`, `createUnit`) or parse new expressions from inside an
 * expression (`evaluate`, `parse`, `compile`, `simplify`, `derivative`, …) are replaced by functions that refuse.
 * expressions.ts additionally admits only arithmetic, a short list of functions, constants, parameters and units.
 */
import { all, create, type MathNode } from "mathjs";

const math = create(all, { number: "number" });

/** Kept before the namespace is locked, like the mathjs documentation's `limitedEvaluate`. */
const parseBeforeLock: (expression: string) => MathNode = math.parse.bind(math);

function refuse(name: string) {
  return () => {
    throw new Error(`Function ${name} is disabled in circuit files`);
  };
}

const DISABLED = [
  "import",
  "createUnit",
  "evaluate",
  "parse",
  "compile",
  "parser",
  "simplify",
  "simplifyConstant",
  "simplifyCore",
  "derivative",
  "resolve",
  "rationalize",
  "reviver",
  "replacer",
  "chain",
  "help",
] as const;

math.import(Object.fromEntries(DISABLED.map((name) => [name, refuse(name)])), { override: true });

export const restrictedMath = {
  parse: parseBeforeLock,
  isValuelessUnit: (name: string): boolean => math.Unit.isValuelessUnit(name),
  isUnit: math.isUnit,
  unit: (spelling: string) => math.unit(spelling),
  typeOf: math.typeOf,
};
