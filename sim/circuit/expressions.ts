/**
 * Expressions over parameters (`"RB*2"`, `"1/(2*pi*1k*RB)"`, `"2n2*2"`, `"10 uF * 2"`). Before mathjs sees an
 * expression, SI-prefixed and RKM literals written against a number (`1k`, `2n2`, `10m`) become plain numbers — so a
 * trailing `m` is milli, never metres; a mathjs unit is written after a space (`10 uF`, `3 m`).
 */
import type { MathNode, Unit } from "mathjs";
import { restrictedMath } from "./restricted-math";
import { PREFIX_EXPONENT, RKM_EXPONENT, SI_PREFIXES, scaleDecimal } from "./values";

/** Longer expressions are refused: a value is a formula, not a program. */
export const MAX_EXPRESSION_LENGTH = 500;

/** Functions an expression may call. Everything else (matrices, assignment, strings, …) is refused. */
const ALLOWED_FUNCTIONS = new Set([
  "sqrt",
  "cbrt",
  "exp",
  "log",
  "log10",
  "log2",
  "pow",
  "abs",
  "min",
  "max",
  "sin",
  "cos",
  "tan",
  "asin",
  "acos",
  "atan",
  "atan2",
  "sinh",
  "cosh",
  "tanh",
  "floor",
  "ceil",
  "round",
  "hypot",
  "nthRoot",
]);
const ALLOWED_OPERATORS = new Set(["add", "subtract", "multiply", "divide", "pow", "unaryMinus", "unaryPlus", "to"]);
const CONSTANTS = new Set(["pi", "e", "tau", "Infinity"]);

const PREFIX_ALTERNATIVES = SI_PREFIXES.map(([p]) => p).join("|");
/** A number with a prefix attached, standing alone: `1k`, `2.2u`, `100meg`, `10m` (not `R1k`, not `10mA`). */
const PREFIXED_NUMBER = new RegExp(
  String.raw`(?<![\w.])((?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)(${PREFIX_ALTERNATIVES})(?![\w.µμ])`,
  "gu",
);
/** An RKM code standing alone and starting with a digit: `2n2`, `4k7`, `4R7` (a bare `R47` could be a parameter). */
const RKM_NUMBER = /(?<![\w.])(\d+)([RfpnuµμmkKMGT])(\d+)(?![\w.µμ])/gu;

export class ExpressionError extends Error {
  constructor(
    readonly reason: "syntax" | "refused" | "unknown_symbol" | "evaluation",
    message: string,
    readonly symbol?: string,
  ) {
    super(message);
  }
}

/** Rewrites prefixed and RKM literals as plain numbers and Ω/µ as mathjs spells them. */
export function prepareExpression(text: string): string {
  return text
    .normalize("NFC")
    .replace(
      RKM_NUMBER,
      (_, whole: string, letter: string, fraction: string) =>
        `(${scaleDecimal(`${whole}.${fraction}`, RKM_EXPONENT.get(letter) ?? 0)})`,
    )
    .replace(
      PREFIXED_NUMBER,
      (_, number: string, prefix: string) => `(${scaleDecimal(number, PREFIX_EXPONENT.get(prefix) ?? 0)})`,
    )
    .replaceAll("Ω", "ohm")
    .replace(/[µμ]/gu, "u");
}

export interface ParsedExpression {
  node: MathNode;
  /** parameter names the expression reads */
  parameters: string[];
}

/**
 * Parses and checks an expression: only arithmetic, the allowed functions, constants, the given parameter names and
 * mathjs units. Throws `ExpressionError`.
 */
export function parseExpression(text: string, parameterNames: ReadonlySet<string>): ParsedExpression {
  if (text.length > MAX_EXPRESSION_LENGTH) {
    throw new ExpressionError("refused", `is longer than ${MAX_EXPRESSION_LENGTH} characters`);
  }
  let node: MathNode;
  try {
    node = restrictedMath.parse(prepareExpression(text));
  } catch (error) {
    throw new ExpressionError("syntax", `does not parse (${(error as Error).message})`);
  }
  const parameters = new Set<string>();
  const functionSymbols = new Set<MathNode>();
  node.traverse((child) => {
    switch (child.type) {
      case "ConstantNode": {
        const value = (child as unknown as { value: unknown }).value;
        if (typeof value !== "number") throw new ExpressionError("refused", "may contain only numbers, not text");
        return;
      }
      case "ParenthesisNode":
        return;
      case "OperatorNode": {
        const fn = (child as unknown as { fn: string }).fn;
        if (!ALLOWED_OPERATORS.has(fn)) {
          throw new ExpressionError(
            "refused",
            `uses the operator ${(child as unknown as { op: string }).op}, which values may not use`,
          );
        }
        return;
      }
      case "FunctionNode": {
        const fn = (child as unknown as { fn: MathNode & { name?: string } }).fn;
        if (fn.type !== "SymbolNode" || !fn.name || !ALLOWED_FUNCTIONS.has(fn.name)) {
          throw new ExpressionError("refused", `calls ${fn.name ?? "a function"}, which values may not use`);
        }
        functionSymbols.add(fn);
        return;
      }
      case "SymbolNode": {
        if (functionSymbols.has(child)) return;
        const name = (child as unknown as { name: string }).name;
        if (parameterNames.has(name)) parameters.add(name);
        else if (!CONSTANTS.has(name) && !restrictedMath.isValuelessUnit(name)) {
          throw new ExpressionError("unknown_symbol", `uses ${name}, which is not a parameter`, name);
        }
        return;
      }
      default:
        throw new ExpressionError("refused", "may contain only arithmetic on numbers, parameters and units");
    }
  });
  return { node, parameters: [...parameters] };
}

export type ExpressionValue = { kind: "number"; value: number } | { kind: "unit"; unit: Unit };

/** Evaluates a checked expression with the parameters (SI numbers) in scope. Throws `ExpressionError`. */
export function evaluateExpression(
  parsed: ParsedExpression,
  parameters: Readonly<Record<string, number>>,
): ExpressionValue {
  const scope = new Map<string, number>();
  for (const name of parsed.parameters) scope.set(name, parameters[name]);
  let result: unknown;
  try {
    result = parsed.node.compile().evaluate(scope);
  } catch (error) {
    throw new ExpressionError("evaluation", `cannot be evaluated (${(error as Error).message})`);
  }
  if (typeof result === "number") return { kind: "number", value: result };
  if (restrictedMath.isUnit(result)) return { kind: "unit", unit: result as Unit };
  throw new ExpressionError("evaluation", `does not give a real number (it gives a ${restrictedMath.typeOf(result)})`);
}
