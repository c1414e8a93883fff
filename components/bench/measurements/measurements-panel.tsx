"use client";
/**
 * The bench's Measurements tab: the design's uploaded measurements, an upload with preview (designers), and the
 * comparison of one measurement with the live simulation — for a frequency response the level offset at the
 * alignment frequency, for a noise spectrum the absolute levels — with the difference curve and the largest deviation
 * inside a chosen band, in a table beside the plot. The measured curve is handed up (`onOverlay`) to be drawn on the
 * Bode plot (a response) or the noise density plot (a noise spectrum).
 */
import { useEffect, useMemo, useState } from "react";
import type { MeasuredCurve } from "@/components/measurements/parse-measurement";
import { type Curve, DEFAULT_ALIGN_HZ } from "./compare";
import { ComparisonTable } from "./comparison-table";
import { DifferencePlot } from "./difference-plot";
import { compareChosen, type MeasurementKind, type MeasurementOverlay, overlayOf, type SimulatedNoise } from "./measurement-overlay";
import { UploadMeasurement } from "./upload-measurement";

export type { MeasurementOverlay };

interface Summary {
  id: string;
  name: string;
  kind: MeasurementKind;
  uploadedByName: string | null;
}

export interface MeasurementsPanelProps {
  workspaceId: string;
  designId: string;
  canUpload: boolean;
  /** the live magnitude response, dB */
  simulated: Curve | null;
  /** the live noise analysis (absent when the circuit has none) */
  simulatedNoise: SimulatedNoise | null;
  onOverlay: (overlay: MeasurementOverlay | null) => void;
}

export function MeasurementsPanel({ workspaceId, designId, canUpload, simulated, simulatedNoise, onOverlay }: MeasurementsPanelProps) {
  const url = `/api/workspaces/${workspaceId}/designs/${designId}/measurements`;
  const [list, setList] = useState<Summary[] | null>(null);
  const [listError, setListError] = useState<string | null>(null);
  const [chosen, setChosen] = useState<string>("");
  const [curve, setCurve] = useState<{ id: string; name: string; kind: MeasurementKind; data: MeasuredCurve } | null>(null);
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
        if (alive) setCurve({ id: data.measurement.id, name: data.measurement.name, kind: data.measurement.kind, data: data.measurement.data });
      })
      .catch((e) => alive && setListError(e instanceof Error ? e.message : String(e)));
    return () => {
      alive = false;
    };
  }, [url, chosen]);

  const chosenComparison = useMemo(
    () => (curve ? compareChosen(curve.kind, curve.data, { response: simulated, noise: simulatedNoise }, band) : null),
    [curve, simulated, simulatedNoise, band],
  );
  const result = chosenComparison?.result ?? null;

  useEffect(() => {
    onOverlay(curve && chosenComparison ? overlayOf(chosenComparison, curve) : null);
  }, [curve, chosenComparison, onOverlay]);

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
          {curve?.kind !== "noise_spectrum" && numberInput("Align at (Hz)", "alignHz")}
        </div>
        {result && !result.ok && <p role="alert" className="text-xs text-caution">{result.message}</p>}
        {chosenComparison?.result.ok && (
          <>
            <ComparisonTable chosen={chosenComparison} />
            <DifferencePlot comparison={chosenComparison.result.comparison} />
          </>
        )}
        {!curve && <p className="text-xs text-ink-soft">Choose a measurement to compare it with the simulated response or noise.</p>}
      </div>
    </div>
  );
}
