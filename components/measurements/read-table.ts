/**
 * The first step of reading a measurement file: bytes → a table of text cells (CSV, TSV or semicolon-separated,
 * found by papaparse), with the header row told apart from the numbers. Pure; runs in the bench's preview and again
 * on the server, which never trusts the browser's reading.
 */
import Papa from "papaparse";

/** Largest measurement file accepted (bytes). A 20 Hz–20 kHz sweep at 1/96 octave is well under 100 kB. */
export const MAX_MEASUREMENT_BYTES = 2_000_000;
/** Most data rows kept: more than any sweep needs, few enough to plot and store as JSON. */
export const MAX_MEASUREMENT_ROWS = 20_000;

export interface MeasurementTable {
  /** the header row's names, or "Column 1", "Column 2", … when the file has none */
  columns: string[];
  /** data rows, cells as written */
  rows: string[][];
  delimiter: string;
  hasHeader: boolean;
}

export type TableResult = { ok: true; table: MeasurementTable } | { ok: false; message: string };

/**
 * Binary files (images, spreadsheets in their native format, archives) hold NUL bytes or bytes that are not UTF-8
 * text; such a file is refused before parsing so the message says what it is, not "no numbers found".
 */
export function looksBinary(bytes: Uint8Array): boolean {
  const sample = bytes.subarray(0, 8192);
  if (sample.includes(0)) return true;
  try {
    new TextDecoder("utf-8", { fatal: true }).decode(sample.length === bytes.length ? sample : trimPartial(sample));
    return false;
  } catch {
    return true;
  }
}

/** A sample cut mid-character would fail UTF-8 decoding; drop a trailing partial sequence (at most 3 bytes). */
function trimPartial(sample: Uint8Array): Uint8Array {
  const end = sample.length;
  for (let back = 1; back <= 3 && end - back >= 0; back++) {
    const byte = sample[end - back];
    if ((byte & 0xc0) === 0xc0) return sample.subarray(0, end - back);
    if ((byte & 0x80) === 0) break;
  }
  return sample;
}

/** A cell that reads as a number (decimal point; exponent allowed). */
export function numberCell(cell: string | undefined): number | null {
  if (cell === undefined) return null;
  const text = cell.trim();
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(text)) return null;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
}

export function readMeasurementTable(bytes: Uint8Array): TableResult {
  if (bytes.byteLength === 0) return { ok: false, message: "The file is empty. Choose a CSV or TSV file with frequency and level columns." };
  if (bytes.byteLength > MAX_MEASUREMENT_BYTES) {
    return { ok: false, message: `The file is larger than ${MAX_MEASUREMENT_BYTES / 1_000_000} MB. Export fewer points per octave.` };
  }
  if (looksBinary(bytes)) {
    return { ok: false, message: "This is not a text file. Export the measurement as CSV or TSV (frequency, level, optional phase)." };
  }
  const text = new TextDecoder("utf-8").decode(bytes).replace(/^\uFEFF/, "");
  const parsed = Papa.parse<string[]>(text, {
    skipEmptyLines: "greedy",
    comments: "#",
    delimitersToGuess: ["\t", ",", ";", "|"],
  });
  const all = parsed.data.filter((row) => row.some((cell) => cell.trim() !== ""));
  // Measurement programs write a few lines of notes before the table; the table starts at the first numeric row.
  const firstNumeric = all.findIndex((row) => row.filter((cell) => numberCell(cell) !== null).length >= 2);
  if (firstNumeric < 0) {
    return {
      ok: false,
      message: "No rows of numbers were found. The file needs at least two numeric columns: frequency and level.",
    };
  }
  const headerRow = firstNumeric > 0 ? all[firstNumeric - 1] : null;
  const rows = all.slice(firstNumeric);
  if (rows.length > MAX_MEASUREMENT_ROWS) {
    return { ok: false, message: `The file has ${rows.length} rows; at most ${MAX_MEASUREMENT_ROWS} are accepted.` };
  }
  const width = Math.max(...rows.map((r) => r.length));
  const columns = Array.from({ length: width }, (_, i) => headerRow?.[i]?.trim() || `Column ${i + 1}`);
  return { ok: true, table: { columns, rows, delimiter: parsed.meta.delimiter, hasHeader: headerRow !== null } };
}
