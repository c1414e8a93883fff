"use client";
/**
 * The bench's live results, whole: figures, plots (with the overlay family, a pinned result and the spread band),
 * the curves table, and tabs for the operating point, destinations and overlays, explanations and calculators.
 * Mount it with the bench document; `onSelectPart` takes the canvas to a part named by an error, warning or
 * explanation; `onApplyValues` writes a calculator's result into a part (absent or readOnly: no writing).
 */
import dynamic from "next/dynamic";
import { memo, useCallback, useEffect, useMemo, useState } from "react";
import type { OpResult } from "@/sim/results";
import { CalculatorsPanel } from "../calculators/calculators-panel";
import type { ApplyValues } from "../calculators/capsule-calculator";
import type { DestinationChoice } from "../destinations/destination-picker";
import { DestinationPicker } from "../destinations/destination-picker";
import { DEFAULT_CABLE_LENGTH_M } from "../destinations/presets";
import type { BenchDocument } from "../document";
import { ELV_LIMIT_V } from "../document/hazards";
import { ExplainPanel } from "../explain/explain-panel";
import { LargeSignalPanel } from "../large-signal/large-signal-panel";
import { maxSplWords } from "../large-signal/limit-words";
import { useLargeSignal } from "../large-signal/use-large-signal";
import { type MeasurementOverlay, MeasurementsPanel } from "../measurements/measurements-panel";
import { OverlayControls, type RevisionSource } from "../overlays/overlay-controls";
import { type PinnedResult, pinCurve } from "../overlays/pinned";
import { OVERLAY_COLOURS, PLOT_COLOURS } from "../plots/palette";
import type { PlotCurve } from "../plots/traces";
import type { BenchSolveError, FamilyResult } from "../solver/protocol";
import { type CircuitChanges, type OverlayChoice, useLiveSolve } from "../solver/use-live-solve";
import { useBenchStore } from "../store/bench-store-context";
import { type CurveRow, CurvesTable } from "./curves-table";
import { FiguresPanel } from "./figures-panel";
import { OperatingPointPanel } from "./operating-point-panel";
import { SolveErrorPanel } from "./solve-error-panel";

// Plotly and the plots load only here, only in the browser.
const PlotsPanel = dynamic(() => import("../plots/plots-panel"), {
  ssr: false,
  loading: () => (
    <div className="h-[420px] animate-pulse rounded bg-paper-deep" role="status" aria-label="Loading plots" />
  ),
});

// A value change renders the results twice (the edit marks them stale, then the result lands): memo keeps the
// panels whose props did not change (the operating point while solving, the plots until their data changes) from
// rendering again. Their props are kept stable below for that.
const Plots = memo(PlotsPanel);
const Figures = memo(FiguresPanel);
const OpPanel = memo(OperatingPointPanel);
const Curves = memo(CurvesTable);

type Tab = "op" | "large" | "overlays" | "measurements" | "explain" | "calculators";
const TABS: { name: Tab; label: string }[] = [
  { name: "op", label: "Operating point" },
  { name: "large", label: "Large signal" },
  { name: "overlays", label: "Destinations & overlays" },
  { name: "measurements", label: "Measurements" },
  { name: "explain", label: "Explain" },
  { name: "calculators", label: "Calculators" },
];

export interface BenchResultsProps {
  document: BenchDocument;
  variant?: string;
  onSelectPart?: (id: string) => void;
  onApplyValues?: ApplyValues;
  selected?: { id: string; kind: string } | null;
  readOnly?: boolean;
  /** where the other revisions of this design are listed (absent on a bench link) */
  revisions?: RevisionSource;
  /**
   * Told the live solve's error and the operating point of the newest result that solved, whenever either changes,
   * so the canvas can mark the part or net at fault and the caution banner can read the real net voltages.
   */
  onLiveState?: (state: BenchLiveState) => void;
}

export interface BenchLiveState {
  error: BenchSolveError | null;
  /** the operating point's nets above the extra-low-voltage limit (null until an operating point has solved) */
  highNets: Record<string, number> | null;
}

/** The nets the caution banner names: only these, so a result that moves no high net leaves the banner alone. */
function highNetsOf(op: OpResult | null): Record<string, number> | null {
  if (!op) return null;
  const high: Record<string, number> = {};
  for (const [net, volts] of Object.entries(op.nets))
    if (typeof volts === "number" && Math.abs(volts) > ELV_LIMIT_V) high[net] = volts;
  return high;
}

const NO_OVERLAYS: OverlayChoice = { variants: [], revisions: [] };
/** One colour for a measured curve on either plot, apart from the overlay family's. */
const MEASURED_COLOUR = "#b4410b";
// one empty list for "no overlay curves", so the curves (and the plot's data) keep their identity across renders:
// a fresh [] each render rebuilt the Bode traces and made Plotly redraw on every render of the results
const NO_FAMILY_CURVES: FamilyResult["curves"] = [];

export function BenchResults({
  document,
  variant,
  onSelectPart,
  onApplyValues,
  selected,
  readOnly,
  revisions,
  onLiveState,
}: BenchResultsProps) {
  const [tab, setTab] = useState<Tab>("op");
  const [destinations, setDestinations] = useState<DestinationChoice>({
    destinations: [],
    cableLengthM: DEFAULT_CABLE_LENGTH_M,
  });
  const [overlays, setOverlays] = useState<OverlayChoice>(NO_OVERLAYS);
  const [pinned, setPinned] = useState<PinnedResult | null>(null);
  const [measured, setMeasured] = useState<MeasurementOverlay | null>(null);
  const store = useBenchStore();
  // the solver hears of a change when the store takes it, before React renders it
  const changes = useCallback<CircuitChanges>(
    (listener) =>
      store.subscribe((next, previous) => {
        if (next.document.circuit !== previous.document.circuit || next.variant !== previous.variant)
          listener(next.document.circuit, next.variant ?? undefined);
      }),
    [store],
  );
  const live = useLiveSolve(document, {
    changes,
    variant,
    destinations: destinations.destinations,
    cableLengthM: destinations.cableLengthM,
    overlays,
  });
  const { result, family } = live;
  const largeSignal = useLargeSignal(document.circuit, variant);
  const largeResult = largeSignal.distortion.job.result;
  const maxSpl = largeResult?.ok ? maxSplWords(largeResult.value.figures) : null;
  const doc = result?.document;
  const liveOp = doc?.op ?? null;
  useEffect(() => {
    onLiveState?.({ error: live.error, highNets: highNetsOf(liveOp) });
  }, [onLiveState, live.error, liveOp]);

  const liveCurve = useMemo((): PlotCurve | null => {
    const ac = doc?.ac;
    if (!ac) return null;
    return {
      id: "live",
      label: variant ? `Design (${variant})` : "Design",
      frequency: ac.frequency,
      magnitude_db: ac.magnitude_db,
      phase_deg: ac.phase_deg,
      style: "live",
    };
  }, [doc, variant]);

  // stable between renders, so the measurements panel compares again only when the result changes
  const simulatedResponse = useMemo(
    () => (liveCurve ? { frequency: liveCurve.frequency, level_db: liveCurve.magnitude_db } : null),
    [liveCurve],
  );
  const measuredNoise = useMemo(
    () =>
      measured?.kind === "noise_spectrum"
        ? { label: measured.label, frequency: measured.frequency, density: measured.density_v, colour: MEASURED_COLOUR }
        : null,
    [measured],
  );

  const familyCurves = family.result?.curves ?? NO_FAMILY_CURVES;
  const curves = useMemo(() => {
    const list: PlotCurve[] = [];
    if (liveCurve) list.push(liveCurve);
    if (pinned) list.push(pinned.curve);
    // a measured response has no simulated phase to sit beside; only its (aligned) magnitude is drawn
    if (measured?.kind === "frequency_response")
      list.push({ ...measured, magnitude_db: measured.level_db, phase_deg: [], style: "overlay", colour: MEASURED_COLOUR });
    familyCurves.forEach((c, i) => {
      if (!c.error)
        list.push({
          id: c.id,
          label: c.label,
          frequency: c.frequency,
          magnitude_db: c.magnitude_db,
          phase_deg: c.phase_deg,
          style: "overlay",
          colour: OVERLAY_COLOURS[i % OVERLAY_COLOURS.length],
        });
    });
    return list;
  }, [liveCurve, pinned, measured, familyCurves]);

  const rows = useMemo((): CurveRow[] => [
    ...(doc
      ? [{ id: "live", label: liveCurve?.label ?? "Design", colour: PLOT_COLOURS.trace, figures: doc.figures }]
      : []),
    ...(pinned
      ? [
          {
            id: pinned.curve.id,
            label: pinned.label,
            colour: PLOT_COLOURS.pinned,
            dashed: true,
            figures: pinned.figures,
          },
        ]
      : []),
    ...familyCurves.map((c, i) => ({
      id: c.id,
      label: c.label,
      colour: OVERLAY_COLOURS[i % OVERLAY_COLOURS.length],
      figures: c.figures,
      problem: c.error?.message,
    })),
  ], [doc, liveCurve, pinned, familyCurves]);

  const envelope = family.result?.spread?.envelope ?? null;
  const spreadMissing = overlays.spread && family.status === "ready" && !family.result?.spread?.envelope;
  const hasCapsule = document.circuit.parts.some((p) => p.kind === "capsule" && p.enabled);
  const warnings = useMemo(
    () => [...(doc?.op?.warnings ?? []), ...(doc?.ac?.warnings ?? []), ...(doc?.noise?.warnings ?? [])],
    [doc],
  );
  const splValue = maxSpl?.value ?? "—";
  const splReason = maxSpl ? (maxSpl.note ?? undefined) : "run the distortion panel (Large signal tab) to find it";
  const extraRows = useMemo(
    () => [{ key: "max-spl", label: "Maximum SPL", value: splValue, reason: splReason }],
    [splValue, splReason],
  );

  return (
    <div
      className="flex flex-col gap-4"
      data-testid="bench-results"
      data-status={live.status}
      data-stale={live.stale ? "true" : "false"}
    >
      {live.error && <SolveErrorPanel error={live.error} onSelectPart={onSelectPart} />}
      <div className="grid grid-cols-1 gap-4 xl:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]">
        <div className="min-w-0 space-y-3">
          <div className="flex items-center justify-between">
            <h2 className="text-lg">Figures</h2>
            {live.stale && (
              <span className="rounded bg-brass-light px-1.5 py-0.5 text-xs text-ink" data-testid="stale-marker">
                {live.status === "error" ? "Out of date" : "Solving…"}
              </span>
            )}
          </div>
          {doc ? (
            <Figures
              figures={doc.figures}
              hasCapsule={hasCapsule}
              noiseRan={doc.noise !== undefined}
              stale={live.stale}
              extraRows={extraRows}
            />
          ) : (
            <p className="text-sm text-ink-soft">
              {live.status === "error" ? "Nothing has solved yet." : "Solving the design…"}
            </p>
          )}
          {rows.length > 1 && <Curves rows={rows} />}
          {family.status === "running" && (
            <div className="flex items-center gap-2 text-xs" data-testid="family-progress">
              <progress
                max={family.progress?.total ?? 1}
                value={family.progress?.done ?? 0}
                className="h-2 w-32"
                aria-label="Overlay progress"
              />
              <span>Solving overlays…</span>
              <button type="button" onClick={family.cancel} className="underline">
                Cancel
              </button>
            </div>
          )}
          {family.status === "cancelled" && (
            <p className="text-xs text-ink-soft">Overlays cancelled; change a choice to solve them again.</p>
          )}
          {spreadMissing && (
            <p className="text-xs text-ink-soft">
              The engine returned no spread band for this circuit yet, so none is drawn.
            </p>
          )}
        </div>
        {doc && result && (
          <Plots
            curves={curves}
            envelope={envelope}
            noise={doc.noise ?? null}
            measuredNoise={measuredNoise}
            impedance={live.impedance}
            generation={live.resultGeneration}
            title={document.circuit.title}
          />
        )}
      </div>
      <div>
        <div role="tablist" aria-label="Results" className="flex flex-wrap gap-1 border-b border-rule">
          {TABS.map((t) => (
            <button
              key={t.name}
              type="button"
              role="tab"
              aria-selected={tab === t.name}
              onClick={() => setTab(t.name)}
              className={`-mb-px border-b-2 px-3 py-1.5 text-sm ${tab === t.name ? "border-brass font-semibold text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
            >
              {t.label}
            </button>
          ))}
        </div>
        <div className="pt-3" role="tabpanel">
          {tab === "op" &&
            (doc?.op ? (
              <OpPanel op={doc.op} warnings={warnings} onSelectPart={onSelectPart} />
            ) : (
              <p className="text-sm text-ink-soft">No operating point yet.</p>
            ))}
          {tab === "large" && <LargeSignalPanel jobs={largeSignal} circuit={document.circuit} variant={variant} />}
          {tab === "overlays" && (
            <div className="grid grid-cols-1 gap-6 md:grid-cols-2">
              <DestinationPicker value={destinations} onChange={setDestinations} />
              <OverlayControls
                variantNames={document.circuit.variants.map((v) => v.name)}
                parameterNames={Object.keys(document.circuit.parameters)}
                value={overlays}
                onChange={setOverlays}
                revisions={revisions}
                canPin={liveCurve !== null && !live.stale}
                pinnedLabel={pinned?.label ?? null}
                onPin={() => liveCurve && doc && setPinned(pinCurve(liveCurve, doc.figures, new Date()))}
                onClearPin={() => setPinned(null)}
              />
            </div>
          )}
          {tab === "measurements" &&
            (revisions ? (
              <MeasurementsPanel
                workspaceId={revisions.workspaceId}
                designId={revisions.designId}
                canUpload={!readOnly}
                simulated={simulatedResponse}
                simulatedNoise={doc?.noise ?? null}
                onOverlay={setMeasured}
              />
            ) : (
              <p className="text-sm text-ink-soft">Measurements are kept with the design; open its bench to compare them.</p>
            ))}
          {tab === "explain" && (
            <ExplainPanel
              circuit={document.circuit}
              variant={variant}
              notes={document.layout.notes}
              onSelectPart={onSelectPart}
            />
          )}
          {tab === "calculators" && (
            <CalculatorsPanel selected={selected} onApplyValues={onApplyValues} readOnly={readOnly} />
          )}
        </div>
      </div>
    </div>
  );
}
