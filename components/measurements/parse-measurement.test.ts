import { describe, expect, it } from "vitest";
import type { MeasurementMapping } from "@/components/schemas/measurement";
import { measurementMappingSchema } from "@/components/schemas/measurement";
import { DBU_TO_DBV_DB, guessMapping, parseMeasurement } from "./parse-measurement";
import { MAX_MEASUREMENT_BYTES, readMeasurementTable } from "./read-table";

const bytes = (text: string) => new TextEncoder().encode(text);
const base: MeasurementMapping = {
  kind: "frequency_response",
  name: "Bench sweep",
  frequencyColumn: 0,
  levelColumn: 1,
  phaseColumn: null,
  frequencyUnit: "Hz",
  levelUnit: "dB",
};

function read(text: string) {
  const result = readMeasurementTable(bytes(text));
  if (!result.ok) throw new Error(result.message);
  return result.table;
}

describe("readMeasurementTable", () => {
  it("reads a CSV with notes and a header above the numbers", () => {
    const table = read("# Larkfield bench rig, 2026-11-30\nsweep notes: capsule LA-7\nFrequency (Hz),Level (dB),Phase (deg)\n20,-3.1,40\n1000,0,2\n20000,-1.2,-30\n");
    expect(table.columns).toEqual(["Frequency (Hz)", "Level (dB)", "Phase (deg)"]);
    expect(table.rows).toHaveLength(3);
    expect(table.hasHeader).toBe(true);
  });
  it("reads a TSV without a header", () => {
    const table = read("20\t-3\n1000\t0\n20000\t-1\n");
    expect(table.delimiter).toBe("\t");
    expect(table.columns).toEqual(["Column 1", "Column 2"]);
  });
  it("refuses a file without numbers, a binary file, an empty file and one over the size limit", () => {
    const none = readMeasurementTable(bytes("frequency,level\nlow,loud\nhigh,quiet\n"));
    expect(none).toMatchObject({ ok: false, message: expect.stringMatching(/No rows of numbers/) });
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    expect(readMeasurementTable(png)).toMatchObject({ ok: false, message: expect.stringMatching(/not a text file/) });
    expect(readMeasurementTable(new Uint8Array(0))).toMatchObject({ ok: false, message: expect.stringMatching(/empty/) });
    expect(readMeasurementTable(new Uint8Array(MAX_MEASUREMENT_BYTES + 1).fill(0x31))).toMatchObject({ ok: false, message: expect.stringMatching(/larger than 2 MB/) });
  });
});

describe("parseMeasurement", () => {
  it("converts kHz to Hz and sorts by frequency", () => {
    const result = parseMeasurement(read("10,1\n0.02,-3\n1,0\n"), { ...base, frequencyUnit: "kHz" });
    expect(result).toEqual({ ok: true, curve: { frequency: [20, 1000, 10_000], level_db: [-3, 0, 1] } });
  });
  it("converts dBu to dBV (0 dBu = 0.7746 V, common practice) and volts to dBV", () => {
    const dbu = parseMeasurement(read("100,0\n1000,4\n10000,-10\n"), { ...base, levelUnit: "dBu" });
    if (!dbu.ok) throw new Error(dbu.message);
    expect(DBU_TO_DBV_DB).toBeCloseTo(-2.2185, 4);
    expect(dbu.curve.level_db[0]).toBeCloseTo(20 * Math.log10(0.774597), 4);
    const volts = parseMeasurement(read("100,1\n1000,0.1\n10000,0.01\n"), { ...base, levelUnit: "V" });
    if (!volts.ok) throw new Error(volts.message);
    expect(volts.curve.level_db.map((v) => Math.round(v * 1e9) / 1e9)).toEqual([0, -20, -40]);
  });
  it("keeps a mapped phase column", () => {
    const result = parseMeasurement(read("f,l,p\n100,0,45\n1000,0,10\n10000,-1,-20\n"), { ...base, phaseColumn: 2 });
    expect(result).toMatchObject({ ok: true, curve: { phase_deg: [45, 10, -20] } });
  });
  it("names the row and column to fix", () => {
    expect(parseMeasurement(read("100,0\n1000,0\n"), { ...base, levelColumn: 4 })).toMatchObject({
      ok: false,
      field: "levelColumn",
      message: "The level column (5) does not exist: the file has 2 columns.",
    });
    expect(parseMeasurement(read("100,0\n1000,x\n2000,1\n"), base)).toMatchObject({ ok: false, message: expect.stringMatching(/Row 2 .*level “x” is not a number/) });
    expect(parseMeasurement(read("100,0\n100,1\n2000,1\n"), base)).toMatchObject({ ok: false, message: expect.stringMatching(/100 Hz appears twice/) });
    expect(parseMeasurement(read("100,0\n200,1\n"), base)).toMatchObject({ ok: false, message: expect.stringMatching(/at least 3/) });
    expect(parseMeasurement(read("100,0\n200,-1\n300,1\n"), { ...base, levelUnit: "V" })).toMatchObject({ ok: false, field: "levelUnit" });
  });
});

describe("mapping", () => {
  it("guesses columns and units from the header", () => {
    const table = read("Phase (deg),Freq (kHz),Level (dBu)\n1,0.1,0\n2,1,0\n3,10,0\n");
    expect(guessMapping(table, "capsule-noise.csv")).toMatchObject({ kind: "noise_spectrum", name: "capsule-noise", frequencyColumn: 1, levelColumn: 2, phaseColumn: 0, frequencyUnit: "kHz", levelUnit: "dBu" });
  });
  it("refuses the same column for frequency and level", () => {
    const result = measurementMappingSchema.safeParse({ ...base, levelColumn: 0 });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].message).toMatch(/different column/);
  });
});
