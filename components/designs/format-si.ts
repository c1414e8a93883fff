/** Engineering notation for the read-only panels: 0.00792 V/Pa → "7.92 mV/Pa", 4700 Ω → "4.70 kΩ". */
const PREFIXES: [number, string][] = [
  [1e9, "G"],
  [1e6, "M"],
  [1e3, "k"],
  [1, ""],
  [1e-3, "m"],
  [1e-6, "µ"],
  [1e-9, "n"],
  [1e-12, "p"],
];

/** Three significant figures, the usual precision of a datasheet. */
const SIGNIFICANT = 3;

export function formatSi(value: number | null | undefined, unit: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  if (value === 0) return `0 ${unit}`.trim();
  const magnitude = Math.abs(value);
  const [scale, prefix] = PREFIXES.find(([s]) => magnitude >= s * 0.9995) ?? PREFIXES[PREFIXES.length - 1];
  return `${(value / scale).toPrecision(SIGNIFICANT)} ${prefix}${unit}`.trim();
}

export function formatDb(value: number | null | undefined, suffix: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return `${value.toFixed(1)} ${suffix}`;
}
