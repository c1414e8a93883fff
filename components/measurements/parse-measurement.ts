/**
 * Table + the preview's mapping → the measured curve that is stored and served: frequency in Hz (ascending), level in
 * dB (dBV for dBV, dBu and V inputs; a noise spectrum in dBV/√Hz), and phase in degrees when mapped. Every refusal
 * says which row or column to fix.
 */
import type { MeasurementMapping } from "@/components/schemas/measurement";
import { type MeasurementTable, numberCell } from "./read-table";

export interface MeasuredCurve {
  frequency: number[];
  level_db: number[];
  phase_deg?: number[];
}

export type CurveResult = { ok: true; curve: MeasuredCurve } | { ok: false; message: string; field?: string };

/** Fewest points that make a curve worth comparing. */
export const MIN_MEASUREMENT_POINTS = 3;
/** 0 dBu is 0.7746 V rms (√0.6 V: 1 mW into 600 Ω), so dBV = dBu + 20·log10(0.7746) ≈ dBu − 2.2185 (common practice). */
export const DBU_TO_DBV_DB = 20 * Math.log10(Math.sqrt(0.6));

export function levelToDb(value: number, unit: MeasurementMapping["levelUnit"]): number | null {
  if (unit === "V") return value > 0 ? 20 * Math.log10(value) : null;
  if (unit === "dBu") return value + DBU_TO_DBV_DB;
  return value;
}

export function parseMeasurement(table: MeasurementTable, mapping: MeasurementMapping): CurveResult {
  const width = table.columns.length;
  const missing = (index: number, field: string, what: string): CurveResult => ({
    ok: false,
    field,
    message: `The ${what} column (${index + 1}) does not exist: the file has ${width} column${width === 1 ? "" : "s"}.`,
  });
  if (mapping.frequencyColumn >= width) return missing(mapping.frequencyColumn, "frequencyColumn", "frequency");
  if (mapping.levelColumn >= width) return missing(mapping.levelColumn, "levelColumn", "level");
  if (mapping.phaseColumn !== null && mapping.phaseColumn >= width) return missing(mapping.phaseColumn, "phaseColumn", "phase");

  const fScale = mapping.frequencyUnit === "kHz" ? 1000 : 1;
  const points: { f: number; level: number; phase?: number }[] = [];
  for (const [i, row] of table.rows.entries()) {
    const line = `Row ${i + 1} of the data`;
    const f = numberCell(row[mapping.frequencyColumn]);
    const raw = numberCell(row[mapping.levelColumn]);
    if (f === null) return { ok: false, field: "frequencyColumn", message: `${line}: the frequency “${row[mapping.frequencyColumn] ?? ""}” is not a number. Check the frequency column.` };
    if (!(f > 0)) return { ok: false, field: "frequencyColumn", message: `${line}: the frequency must be above 0 Hz.` };
    if (raw === null) return { ok: false, field: "levelColumn", message: `${line}: the level “${row[mapping.levelColumn] ?? ""}” is not a number. Check the level column.` };
    const level = levelToDb(raw, mapping.levelUnit);
    if (level === null) return { ok: false, field: "levelUnit", message: `${line}: a level in volts must be above 0 V (or choose a dB unit).` };
    let phase: number | undefined;
    if (mapping.phaseColumn !== null) {
      const p = numberCell(row[mapping.phaseColumn]);
      if (p === null) return { ok: false, field: "phaseColumn", message: `${line}: the phase “${row[mapping.phaseColumn] ?? ""}” is not a number. Choose another phase column or none.` };
      phase = p;
    }
    points.push({ f: f * fScale, level, phase });
  }
  if (points.length < MIN_MEASUREMENT_POINTS) {
    return { ok: false, message: `The file has ${points.length} point${points.length === 1 ? "" : "s"}; at least ${MIN_MEASUREMENT_POINTS} are needed.` };
  }
  points.sort((a, b) => a.f - b.f);
  for (let i = 1; i < points.length; i++) {
    if (points[i].f === points[i - 1].f) {
      return { ok: false, field: "frequencyColumn", message: `The frequency ${points[i].f} Hz appears twice. Each frequency may appear once.` };
    }
  }
  const curve: MeasuredCurve = { frequency: points.map((p) => p.f), level_db: points.map((p) => p.level) };
  if (mapping.phaseColumn !== null) curve.phase_deg = points.map((p) => p.phase ?? 0);
  return { ok: true, curve };
}

/** The mapping the preview starts from: first column frequency, second level, a third column as phase. */
export function guessMapping(table: MeasurementTable, fileName: string): Omit<MeasurementMapping, "kind"> & { kind: MeasurementMapping["kind"] } {
  const header = table.columns.map((c) => c.toLowerCase());
  const find = (re: RegExp) => header.findIndex((h) => re.test(h));
  const f = find(/freq|hz/);
  const frequencyColumn = Math.max(f, 0);
  const p = find(/phase|deg/);
  const l = header.findIndex((h, i) => i !== frequencyColumn && i !== p && /db|level|mag|spl|v/.test(h));
  const levelColumn = l >= 0 ? l : frequencyColumn === 0 ? 1 : 0;
  const phaseColumn = p >= 0 && p !== levelColumn && p !== frequencyColumn ? p : null;
  const kHz = /khz/.test(header[frequencyColumn] ?? "");
  const levelHeader = header[levelColumn] ?? "";
  const levelUnit = /dbu/.test(levelHeader) ? "dBu" : /dbv/.test(levelHeader) ? "dBV" : /db/.test(levelHeader) ? "dB" : /\bv\b|volt/.test(levelHeader) ? "V" : "dB";
  const noisy = /noise/.test(`${fileName} ${header.join(" ")}`);
  return {
    kind: noisy ? "noise_spectrum" : "frequency_response",
    name: fileName.replace(/\.[A-Za-z0-9]+$/, "").slice(0, 120) || "Measurement",
    frequencyColumn,
    levelColumn,
    phaseColumn,
    frequencyUnit: kHz ? "kHz" : "Hz",
    levelUnit,
  };
}
