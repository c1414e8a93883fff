/**
 * Numbers for people: engineering notation with an SI prefix and the quantity's unit ("4.7 kΩ", "50 pF", "1 GΩ"),
 * three significant figures, the way values are printed on a schematic (common practice).
 */

const PREFIXES: [number, string][] = [
  [1e12, "T"],
  [1e9, "G"],
  [1e6, "M"],
  [1e3, "k"],
  [1, ""],
  [1e-3, "m"],
  [1e-6, "µ"],
  [1e-9, "n"],
  [1e-12, "p"],
  [1e-15, "f"],
];

/** Significant figures shown. */
const DIGITS = 3;

export function formatSI(value: number, unit = ""): string {
  if (!Number.isFinite(value)) return value > 0 ? `∞${unit ? ` ${unit}` : ""}` : value < 0 ? `−∞` : "—";
  if (value === 0) return `0${unit ? ` ${unit}` : ""}`;
  const magnitude = Math.abs(value);
  const [scale, prefix] = PREFIXES.find(([s]) => magnitude >= s * (1 - 5e-4)) ?? PREFIXES[PREFIXES.length - 1];
  const scaled = value / scale;
  const text = Number(scaled.toPrecision(DIGITS)).toString().replace("-", "−");
  const suffix = `${prefix}${unit}`;
  return suffix ? `${text} ${suffix}` : text;
}
