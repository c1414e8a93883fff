"use client";
/**
 * Upload with a preview: the file is read in the browser with the same parser the server uses, its first rows are
 * shown, and the person maps the columns and chooses units before saving. The server reads it again and decides.
 */
import { useState } from "react";
import { guessMapping, parseMeasurement } from "@/components/measurements/parse-measurement";
import { MAX_MEASUREMENT_BYTES, type MeasurementTable, readMeasurementTable } from "@/components/measurements/read-table";
import { FREQUENCY_UNITS, LEVEL_UNITS, type MeasurementMapping, measurementMappingSchema } from "@/components/schemas/measurement";

const input = "rounded border border-rule bg-paper px-1.5 py-0.5 text-xs";

export function UploadMeasurement({ url, onSaved }: { url: string; onSaved: (id: string) => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [table, setTable] = useState<MeasurementTable | null>(null);
  const [mapping, setMapping] = useState<MeasurementMapping | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const choose = async (chosen: File | undefined) => {
    setError(null);
    setTable(null);
    setFile(chosen ?? null);
    if (!chosen) return;
    if (chosen.size > MAX_MEASUREMENT_BYTES) return setError(`The file is larger than ${MAX_MEASUREMENT_BYTES / 1_000_000} MB. Export fewer points per octave.`);
    const read = readMeasurementTable(new Uint8Array(await chosen.arrayBuffer()));
    if (!read.ok) return setError(read.message);
    setTable(read.table);
    setMapping(guessMapping(read.table, chosen.name));
  };

  const set = (patch: Partial<MeasurementMapping>) => mapping && setMapping({ ...mapping, ...patch });
  const checked = table && mapping ? measurementMappingSchema.safeParse(mapping) : null;
  const preview = table && checked?.success ? parseMeasurement(table, checked.data) : null;
  const problem = checked && !checked.success ? checked.error.issues[0].message : preview && !preview.ok ? preview.message : null;

  const save = async () => {
    if (!file || !checked?.success) return;
    setBusy(true);
    setError(null);
    const form = new FormData();
    form.set("file", file);
    form.set("mapping", JSON.stringify(checked.data));
    try {
      const response = await fetch(url, { method: "POST", body: form, credentials: "same-origin" });
      const data = await response.json().catch(() => null);
      if (!response.ok) throw new Error(data?.error?.message ?? `The server answered ${response.status}. Try again.`);
      setFile(null);
      setTable(null);
      onSaved(data.measurement.id);
    } catch (e) {
      setError(e instanceof Error && e.message !== "Failed to fetch" ? e.message : "Backplate's server cannot be reached. Try again.");
    } finally {
      setBusy(false);
    }
  };

  const columnSelect = (label: string, value: number | null, onChange: (v: number | null) => void, optional = false) => (
    <label className="flex flex-col gap-0.5 text-xs">
      {label}
      <select className={input} value={value ?? ""} onChange={(e) => onChange(e.target.value === "" ? null : Number(e.target.value))}>
        {optional && <option value="">None</option>}
        {table?.columns.map((c, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: a column is its position in the file
          <option key={i} value={i}>
            {i + 1}: {c}
          </option>
        ))}
      </select>
    </label>
  );

  return (
    <div className="space-y-2 rounded border border-rule p-3" data-testid="measurement-upload">
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-semibold">Upload a measurement (CSV or TSV, up to 2 MB)</span>
        <input type="file" accept=".csv,.tsv,.txt,text/csv,text/tab-separated-values,text/plain" onChange={(e) => choose(e.target.files?.[0])} className="text-xs" />
      </label>
      {table && mapping && (
        <div className="space-y-2">
          <div className="overflow-x-auto">
            <table className="text-xs" aria-label="First rows of the file">
              <thead>
                <tr>{table.columns.map((c, i) => (
                  // biome-ignore lint/suspicious/noArrayIndexKey: a column is its position in the file
                  <th key={i} className="border-b border-rule px-2 text-left font-medium">{i + 1}: {c}</th>
                ))}</tr>
              </thead>
              <tbody className="font-mono">
                {table.rows.slice(0, 4).map((row, r) => (
                  // biome-ignore lint/suspicious/noArrayIndexKey: preview rows have no identity beyond their place
                  <tr key={r}>{table.columns.map((_, i) => (
                    // biome-ignore lint/suspicious/noArrayIndexKey: a cell is its position in the row
                    <td key={i} className="px-2">{row[i] ?? ""}</td>
                  ))}</tr>
                ))}
              </tbody>
            </table>
            <p className="text-xs text-ink-soft">{table.rows.length} rows</p>
          </div>
          <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
            <label className="col-span-2 flex flex-col gap-0.5 text-xs">
              Name
              <input className={input} value={mapping.name} onChange={(e) => set({ name: e.target.value })} />
            </label>
            <label className="col-span-2 flex flex-col gap-0.5 text-xs">
              Kind
              <select className={input} value={mapping.kind} onChange={(e) => set({ kind: e.target.value as MeasurementMapping["kind"] })}>
                <option value="frequency_response">Frequency response</option>
                <option value="noise_spectrum">Noise spectrum</option>
              </select>
            </label>
            {columnSelect("Frequency column", mapping.frequencyColumn, (v) => set({ frequencyColumn: v ?? 0 }))}
            <label className="flex flex-col gap-0.5 text-xs">
              Frequency unit
              <select className={input} value={mapping.frequencyUnit} onChange={(e) => set({ frequencyUnit: e.target.value as MeasurementMapping["frequencyUnit"] })}>
                {FREQUENCY_UNITS.map((u) => <option key={u}>{u}</option>)}
              </select>
            </label>
            {columnSelect("Level column", mapping.levelColumn, (v) => set({ levelColumn: v ?? 0 }))}
            <label className="flex flex-col gap-0.5 text-xs">
              Level unit
              <select className={input} value={mapping.levelUnit} onChange={(e) => set({ levelUnit: e.target.value as MeasurementMapping["levelUnit"] })}>
                {LEVEL_UNITS.map((u) => <option key={u}>{u}</option>)}
              </select>
            </label>
            {columnSelect("Phase column", mapping.phaseColumn, (v) => set({ phaseColumn: v }), true)}
          </div>
          {preview?.ok && (
            <p className="text-xs text-ink-soft">
              {preview.curve.frequency.length} points, {Math.round(preview.curve.frequency[0])} Hz – {Math.round(preview.curve.frequency.at(-1) ?? 0)} Hz
            </p>
          )}
          <button type="button" disabled={busy || !!problem} onClick={save} className="rounded bg-graphite px-3 py-1 text-xs text-paper disabled:opacity-50">
            {busy ? "Saving…" : "Save measurement"}
          </button>
        </div>
      )}
      {(error || problem) && (
        <p role="alert" className="rounded border border-caution/40 bg-caution-bg px-2 py-1 text-xs text-caution">
          {error ?? problem}
        </p>
      )}
    </div>
  );
}
