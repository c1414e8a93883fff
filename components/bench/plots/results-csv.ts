/**
 * The plotted results as CSV: one row per frequency of the first column set, a column per curve quantity. A curve
 * on another frequency grid gets its values where the frequencies coincide and empty cells elsewhere (no
 * interpolation: the file holds only what was solved). RFC 4180 quoting for names with commas or quotes.
 */

export interface CsvSeries {
  name: string;
  frequency: number[];
  values: number[];
}

function quote(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

export function resultsCsv(series: CsvSeries[]): string {
  if (series.length === 0) return "frequency_hz\n";
  const grid = series[0].frequency;
  const lookups = series.map((s) => new Map(s.frequency.map((f, i) => [f, s.values[i]])));
  const header = ["frequency_hz", ...series.map((s) => quote(s.name))].join(",");
  const rows = grid.map((f) =>
    [String(f), ...lookups.map((m) => (m.has(f) && Number.isFinite(m.get(f)) ? String(m.get(f)) : ""))].join(","),
  );
  return `${[header, ...rows].join("\n")}\n`;
}

/** Offers a text as a download (browser only). */
export function downloadText(filename: string, text: string, type = "text/csv"): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement("a");
  a.href = url;
  a.download = filename;
  a.click();
  URL.revokeObjectURL(url);
}
