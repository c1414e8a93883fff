/**
 * Numbers for people on the canvas and in the part sheet: engineering notation with an SI prefix and the quantity's
 * unit ("4.7 kΩ", "50 pF", "1 GΩ"), three significant figures, the way values are printed on a schematic (common
 * practice), with a true minus sign and ∞ for an open value. The prefixes and rounding are the results panels'
 * (results/format.ts), so a value reads the same on the canvas as in the figures.
 */
import { formatSi } from "../results/format";

export function formatSI(value: number, unit = ""): string {
  if (!Number.isFinite(value)) return value > 0 ? `∞${unit ? ` ${unit}` : ""}` : value < 0 ? `−∞` : "—";
  return formatSi(value, unit).trimEnd().replace("-", "−");
}
