"use client";
/**
 * The bench's Measurements tab: the design's uploaded measurements, an upload with preview (designers), and the
 * comparison of one measurement with the live simulation — level offset at the alignment frequency, the difference
 * curve, and the largest deviation inside a chosen band, in a table beside the plot. The aligned measurement is
 * handed up (`onOverlay`) to be drawn on the Bode plot.
 */
import { useEffect, useMemo, useState } from "react";
import type { MeasuredCurve } from "@/components/measurements/parse-measurement";
import { type Curve, compareMeasurement, DEFAULT_ALIGN_HZ } from "./compare";
import { DifferencePlot } from "./difference-plot";
import { UploadMeasurement } from "./upload-measurement";

interface Summary {
  id: string;
  name: string;
  kind: "frequency_response" | "noise_spectrum";
  uploadedByName: string | null;
}

export interface MeasurementOverlay {
  id: string;
  label: string;
  frequency: number[];
  level_db: number[];
}

export interface MeasurementsPanelProps {
  workspaceId: string;
  designId: string;
  canUpload: boolean;
  simulated: Curve | null;
  onOverlay: (overlay: MeasurementOverlay | null) => void;
}

const fmt = (v: number, digits = 2) => (v >= 0 ? `+${v.toFixed(digits)}` : `−${Math.abs(v).toFixed(digits)}`);
const hz = (v: number) => (v >= 1000 ? `${(v / 1000).toPrecision(3)} kHz` : `${v.toPrecision(3)} Hz`);

export function MeasurementsPanel({ workspaceId, designId, canUpload, simulated, onOverlay }: MeasurementsPanelProps) {
  const url = `/api/workspaces/${workspaceId}/designs/${designId}/measurements`;
  const [list, setList] = useState<Summary[] | null>(null);
  const [listError, setListError] = useState<string | null>(null);
  const [chosen, setChosen] = useState<string>("");
  const [curve, setCurve] = useState<{ id: string; name: string; data: MeasuredCurve } | null>(null);
  const [band, setBand] = useState({ fromHz: 20, toHz: 20_000, alignHz: DEFAULT_ALIGN_HZ });
  const [refresh, setRefresh] = useState(0);

  useEffect(() => {
    let alive = true;
    // `refresh` in the query string both re-runs this after an upload and keeps a cached list from answering
    fetch(`${url}?v=${refresh}`, { credentials: "same-origin", cache: "no-store" })
      .then(async (r) => {
        const data = await r.json();
        if (!r.ok) throw new Error(data?.error?.message ?? "The measurements could not be listed.");
        if (alive) setList(data.measurements);
      })
      .catch((e) => alive && setListError(e instanceof Error ? e.message : String(e)));
    return () => {
      alive = false;
    };
  }, [url, refresh]);

  useEffect(() => {
    if (!chosen) return setCurve(null);
    let alive = true;
    fetch(`${url}/${chosen}`, { credentials: "same-origin" })
      .then(async (r) => {
        const data = await r.json();
        if (!r.ok) throw new Error(data?.error?.message ?? "The measurement could not be read.");
        if (alive) setCurve({ id: data.measurement.id, name: data.measurement.name, data: data.measurement.data });
      })
      .catch((e) => alive && setListError(e instanceof Error ? e.message : String(e)));
    return () => {
      alive = false;
    };
  }, [url, chosen]);

  const result = useMemo(
    () => (curve && simulated ? compareMeasurement(simulated, curve.data, band) : null),
    [curve, simulated, band],
  );

  useEffect(() => {
    if (!curve || !result?.ok) return onOverlay(null);
    const c = result.comparison;
    onOverlay({ id: `measurement-${curve.id}`, label: `${curve.name} (measured, ${fmt(c.offset_db, 1)} dB)`, frequency: c.frequency, level_db: c.measured_aligned_db });
  }, [curve, result, onOverlay]);

  const numberInput = (label: string, key: keyof typeof band) => (
    <label className="flex flex-col gap-0.5 text-xs">
      {label}
      <input
        type="number"
        min={1}
        className="w-24 rounded border border-rule bg-paper px-1.5 py-0.5 font-mono text-xs"
        value={band[key]}
        onChange={(e) => {
          const v = Number(e.target.value);
          if (v > 0) setBand({ ...band, [key]: v });
        }}
      />
    </label>
  );

  return (
    <div className="grid grid-cols-1 gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]" data-testid="measurements-panel">
      <div className="space-y-3">
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-semibold">Measurement to overlay</span>
          <select className="rounded border border-rule bg-paper px-2 py-1 text-sm" value={chosen} onChange={(e) => setChosen(e.target.value)} aria-label="Measurement to overlay">
            <option value="">None</option>
            {list?.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name} · {m.kind === "noise_spectrum" ? "noise" : "response"}
                {m.uploadedByName ? ` · ${m.uploadedByName}` : ""}
              </option>
            ))}
          </select>
        </label>
        {list?.length === 0 && <p className="text-xs text-ink-soft">No measurements on this design yet.</p>}
        {listError && <p role="alert" className="text-xs text-caution">{listError}</p>}
        {canUpload && (
          <UploadMeasurement
            url={url}
            onSaved={(id) => {
              setRefresh((n) => n + 1);
              setChosen(id);
            }}
          />
        )}
      </div>
      <div className="space-y-3">
        <div className="flex flex-wrap gap-3">
          {numberInput("Band from (Hz)", "fromHz")}
          {numberInput("Band to (Hz)", "toHz")}
          {numberInput("Align at (Hz)", "alignHz")}
        </div>
        {result && !result.ok && <p role="alert" className="text-xs text-caution">{result.message}</p>}
        {result?.ok && (
          <>
            <table className="text-sm" aria-label="Measurement against simulation" data-testid="comparison-table">
              <tbody>
                <tr><th className="pr-4 text-left font-medium text-ink-soft">Level offset at {hz(result.comparison.alignHz)}</th><td className="font-mono" data-testid="offset-db">{fmt(result.comparison.offset_db)} dB</td></tr>
                <tr><th className="pr-4 text-left font-medium text-ink-soft">Largest deviation, {hz(result.comparison.band.fromHz)} – {hz(result.comparison.band.toHz)}</th><td className="font-mono" data-testid="max-deviation-db">{result.comparison.max ? `${fmt(result.comparison.max.deviation_db)} dB` : "no points in the band"}</td></tr>
                <tr><th className="pr-4 text-left font-medium text-ink-soft">At</th><td className="font-mono" data-testid="max-deviation-hz">{result.comparison.max ? hz(result.comparison.max.frequency) : "—"}</td></tr>
                <tr><th className="pr-4 text-left font-medium text-ink-soft">Points compared</th><td className="font-mono">{result.comparison.frequency.length}</td></tr>
              </tbody>
            </table>
            <DifferencePlot comparison={result.comparison} />
          </>
        )}
        {!curve && <p className="text-xs text-ink-soft">Choose a measurement to compare it with the simulated response.</p>}
      </div>
    </div>
  );
}
