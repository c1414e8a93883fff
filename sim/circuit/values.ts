/**
 * Literal values: plain and SI-prefixed numbers with an optional unit (`47k`, `4.7 kΩ`, `50 pF`, `100meg`), IEC 60062
 * RKM codes (`4k7`, `R47`, `2n2`, `1G0`) and relative tolerances (`"5%"`, 0.05). Expressions over parameters are in
 * expressions.ts; this file knows nothing about mathjs.
 */
import { QUANTITIES_WITH_UNITS, type Quantity } from "./quantities";

/** SI prefixes, longest spelling first so that `meg` wins over `m`. `K` is kilo as in RKM codes (`4K7`). */
/** Each prefix with its power of ten. */
export const SI_PREFIXES: readonly (readonly [string, number])[] = [
  ["meg", 6],
  ["Meg", 6],
  ["MEG", 6],
  ["f", -15],
  ["p", -12],
  ["n", -9],
  ["u", -6],
  ["µ", -6],
  ["μ", -6],
  ["m", -3],
  ["k", 3],
  ["K", 3],
  ["M", 6],
  ["G", 9],
  ["T", 12],
];

/** prefix → power of ten */
export const PREFIX_EXPONENT: ReadonlyMap<string, number> = new Map(SI_PREFIXES);

/** The letters an IEC 60062 RKM code may use in place of the decimal point; `R` is the ×1 multiplier. */
export const RKM_EXPONENT: ReadonlyMap<string, number> = new Map<string, number>([
  ["R", 0],
  ...SI_PREFIXES.filter(([p]) => p.length === 1),
]);

/**
 * `decimal` × 10^`exponent`, rounded once from the decimal text (so `2.2` with −9 is exactly the double nearest
 * 2.2e-9, not 2.2 × 1e-9).
 */
export function scaleDecimal(decimal: string, exponent: number): number {
  const [mantissa, ownExponent = "0"] = decimal.split(/[eE]/);
  return Number(`${mantissa}e${Number(ownExponent) + exponent}`);
}

const NUMBER_PATTERN = String.raw`[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?`;
const NUMBER_WITH_SUFFIX = new RegExp(String.raw`^(${NUMBER_PATTERN})(\s*)(.*)$`, "s");
/** `4k7`, `R47`, `2n2`, `47K3`, `1G0`: optional digits, one multiplier letter, digits. */
const RKM_CODE = /^([+-]?)(\d*)([RfpnuµμmkKMGT])(\d+)(\s*)(.*)$/s;
/** `47R`: digits then R, the RKM way of writing a whole number of ohms. */
const RKM_TRAILING_R = /^([+-]?\d+)R(\s*)(.*)$/s;
const INFINITY_WORDS = /^([+-]?)(inf|Inf|INF|infinity|Infinity|∞)$/;

export type LiteralResult =
  | { kind: "value"; value: number }
  /** the text carries a unit that belongs to another quantity */
  | { kind: "wrong_unit"; unit: string; unitQuantity: Quantity }
  | { kind: "not_literal" };

type SuffixResult =
  | { kind: "factor"; exponent: number }
  | { kind: "wrong_unit"; unitQuantity: Quantity }
  | { kind: "none" };

/** The power of ten a unit spelling with an optional prefix stands for, or undefined when it is not one. */
function unitExponent(suffix: string, quantity: Quantity): number | undefined {
  for (const unit of quantity.units) {
    if (suffix === unit) return 0;
  }
  if (!quantity.prefixable) return undefined;
  for (const [prefix, exponent] of SI_PREFIXES) {
    if (!suffix.startsWith(prefix)) continue;
    const rest = suffix.slice(prefix.length);
    if (quantity.units.includes(rest)) return exponent;
  }
  return undefined;
}

/**
 * What a suffix after a number means for a field of `quantity`. Without a space a lone `m` is always milli (the
 * contract: "a trailing m is milli, never metres"); after a space it is metres in a length field.
 */
function resolveSuffix(suffix: string, spaced: boolean, quantity: Quantity): SuffixResult {
  if (suffix === "") return { kind: "factor", exponent: 0 };
  if (suffix === "m" && !spaced) return { kind: "factor", exponent: -3 };
  if (quantity.name === "any") {
    // a parameter has no quantity: a prefix wins over a unit of the same spelling (`47K` is 47 000, not kelvin)
    const prefix = PREFIX_EXPONENT.get(suffix);
    if (prefix !== undefined) return { kind: "factor", exponent: prefix };
    for (const other of QUANTITIES_WITH_UNITS) {
      const exponent = unitExponent(suffix, other);
      if (exponent !== undefined) return { kind: "factor", exponent };
    }
  } else {
    const exponent = unitExponent(suffix, quantity);
    if (exponent !== undefined) return { kind: "factor", exponent };
  }
  const bare = PREFIX_EXPONENT.get(suffix);
  if (bare !== undefined) return { kind: "factor", exponent: bare };
  for (const other of QUANTITIES_WITH_UNITS) {
    if (other.name !== quantity.name && unitExponent(suffix, other) !== undefined) {
      return { kind: "wrong_unit", unitQuantity: other };
    }
  }
  return { kind: "none" };
}

/** An RKM code may be followed by a unit without a prefix (`4k7 Ω`, `2n2F`); the letter is the prefix. */
function rkmUnit(rest: string, quantity: Quantity): SuffixResult {
  if (rest === "" || quantity.units.includes(rest)) return { kind: "factor", exponent: 0 };
  for (const other of QUANTITIES_WITH_UNITS) {
    if (other.name !== quantity.name && other.units.includes(rest)) return { kind: "wrong_unit", unitQuantity: other };
  }
  return { kind: "none" };
}

function fromSuffix(text: string, decimal: string, suffix: SuffixResult, unit: string): LiteralResult {
  if (suffix.kind === "factor") return { kind: "value", value: scaleDecimal(decimal, suffix.exponent) };
  if (suffix.kind === "wrong_unit")
    return { kind: "wrong_unit", unit: unit || text, unitQuantity: suffix.unitQuantity };
  return { kind: "not_literal" };
}

/** Parses a literal value for a field of `quantity`, returning the SI number. Never throws. */
export function parseLiteral(raw: string, quantity: Quantity): LiteralResult {
  const text = raw.normalize("NFC").trim();
  const infinity = INFINITY_WORDS.exec(text);
  if (infinity) return { kind: "value", value: infinity[1] === "-" ? -Infinity : Infinity };

  const rkm = RKM_CODE.exec(text);
  if (rkm) {
    const [, sign, whole, letter, fraction, , rest] = rkm;
    const decimal = `${sign}${whole || "0"}.${fraction}`;
    const unit = rkmUnit(rest, quantity);
    if (unit.kind !== "factor") return fromSuffix(text, decimal, unit, rest);
    return { kind: "value", value: scaleDecimal(decimal, RKM_EXPONENT.get(letter) ?? 0) };
  }
  const trailingR = RKM_TRAILING_R.exec(text);
  if (trailingR) {
    const [, digits, , rest] = trailingR;
    return fromSuffix(text, digits, rkmUnit(rest, quantity), rest);
  }

  const match = NUMBER_WITH_SUFFIX.exec(text);
  if (!match) return { kind: "not_literal" };
  const [, number, space, suffix] = match;
  return fromSuffix(text, number, resolveSuffix(suffix, space.length > 0, quantity), suffix);
}

/** True when text reads as one number with letters after it (so a failure is a mistyped value, not an expression). */
export function looksLikeLiteral(text: string): boolean {
  return new RegExp(String.raw`^(${NUMBER_PATTERN}|[+-]?R\d)\s*[\p{L}°√/^().\d-]*$`, "u").test(text.trim());
}

export type ToleranceResult = { kind: "value"; value: number } | { kind: "invalid" };

/** `"5%"` → 0.05, `0.05` → 0.05, `"0.05"` → 0.05. Range is checked by the caller. */
export function parseTolerance(raw: number | string): ToleranceResult {
  if (typeof raw === "number") return Number.isFinite(raw) ? { kind: "value", value: raw } : { kind: "invalid" };
  const percent = new RegExp(String.raw`^(${NUMBER_PATTERN})\s*%$`).exec(raw.trim());
  if (percent) return { kind: "value", value: Number(percent[1]) / 100 };
  if (new RegExp(`^${NUMBER_PATTERN}$`).test(raw.trim())) return { kind: "value", value: Number(raw) };
  return { kind: "invalid" };
}
