/** A file size in SI units (1 kB = 1000 B, as IEC 80000-13 and the 20 MB limit use them), three significant figures. */
export function formatSize(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  const units = ["kB", "MB", "GB"];
  let value = bytes / 1000;
  let unit = 0;
  while (value >= 999.5 && unit < units.length - 1) {
    value /= 1000;
    unit += 1;
  }
  return `${value >= 100 ? Math.round(value) : Number(value.toPrecision(3))} ${units[unit]}`;
}
