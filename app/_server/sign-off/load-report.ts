import "server-only";
/**
 * Gathers a revision's sign-off report: the revision and its layout, a fresh run of the engine (figures, target
 * checks, response, noise, spread), the response into each chosen destination, every measurement of the design
 * against the simulated response, the remarks and decisions of its reviews, and the safety cautions.
 */
import { openDocument } from "@/components/bench/document/document";
import { hazardReasons } from "@/components/bench/document/hazards";
import { compareMeasurement } from "@/components/bench/measurements/compare";
import { compareNoise } from "@/components/bench/measurements/compare-noise";
import { dbvToDensity } from "@/components/bench/measurements/measurement-overlay";
import { withDestination } from "@/components/bench/destinations/with-destination";
import { DEFAULT_CABLE_LENGTH_M, DESTINATION_PRESETS } from "@/components/bench/destinations/presets";
import { OVERLAY_COLOURS, PLOT_COLOURS } from "@/components/bench/plots/palette";
import { formatFixed, formatSi } from "@/components/bench/results/format";
import { runRevision } from "@/components/designs/run-revision";
import { figureLabel, formatFigure } from "@/components/reviews/checks-panel";
import { runSavedRevision } from "@/app/_server/revision-runs";
import { type PlotSeries, plotGeometry } from "@/components/report/plot-geometry";
import { anchorText, type ReportModel, type ReportPlot } from "@/components/report/report-model";
import { schematicGeometry } from "@/components/report/schematic-geometry";
import type { WorkspaceMembership } from "@/db/memberships";
import { getDesign } from "@/db/designs";
import { listMeasurementCurves } from "@/db/measurements";
import { getRevision } from "@/db/revisions";
import { signOffRecord } from "@/db/sign-off";

/** The plot box in PDF points (A4 width less margins); the page scales the same geometry to its width. */
export const REPORT_PLOT_BOX = { width: 515, height: 190 };
/** Room for the circuit picture: the page width, and what is left of the first page under the heading. */
const SCHEMATIC_FIT = { width: 515, height: 500 };
/** Band over which the largest deviation is reported: the audio band (common practice). */
export const REPORT_BAND = { fromHz: 20, toHz: 20_000 };

const when = (d: Date) => `${d.toISOString().replace("T", " ").slice(0, 16)} UTC`;
const num = (v: unknown) => (typeof v === "number" ? v : null);
const text = (v: unknown) => (typeof v === "string" || typeof v === "number" ? String(v) : JSON.stringify(v));

function plot(title: string, series: PlotSeries[], yUnit: string, yLog = false, note?: string): ReportPlot | null {
  const geometry = plotGeometry(series, { ...REPORT_PLOT_BOX, yLog, yUnit });
  if (!geometry) return null;
  return { title, geometry, note, legend: series.map((s) => ({ label: s.label, colour: s.colour, dashed: Boolean(s.dashed) })) };
}

export function destinationChoice(ids: string[] | undefined) {
  const wanted = ids && ids.length > 0 ? ids : DESTINATION_PRESETS.slice(0, 2).map((d) => d.id);
  return DESTINATION_PRESETS.filter((d) => wanted.includes(d.id));
}

export async function loadReport(
  membership: WorkspaceMembership,
  designId: string,
  revisionId: string,
  options: { destinations?: string[]; origin: string },
): Promise<ReportModel> {
  const { workspaceId, slug } = membership;
  const [design, revision] = await Promise.all([getDesign(workspaceId, designId), getRevision(workspaceId, designId, revisionId)]);
  const [measured, record] = await Promise.all([listMeasurementCurves(workspaceId, designId), signOffRecord(workspaceId, designId, revisionId)]);
  const document = openDocument(revision.circuit, revision.layout);
  const hasStoredLayout = Boolean(revision.layout && Object.keys((revision.layout as { parts?: object }).parts ?? {}).length > 0);
  const run = runSavedRevision(revision.id, revision.circuit);
  const doc = run.ok ? run.document : null;
  const f = doc?.figures ?? {};

  const plots: ReportPlot[] = [];
  if (doc?.ac) {
    const series: PlotSeries[] = [{ label: "Unloaded output", colour: PLOT_COLOURS.trace, frequency: doc.ac.frequency, values: doc.ac.magnitude_db }];
    destinationChoice(options.destinations).forEach((dest, i) => {
      const loaded = runRevision(withDestination(document.circuit, dest, DEFAULT_CABLE_LENGTH_M));
      if (loaded.ok && loaded.document.ac) {
        series.push({ label: `${dest.name}, ${DEFAULT_CABLE_LENGTH_M} m cable`, colour: OVERLAY_COLOURS[i % OVERLAY_COLOURS.length], frequency: loaded.document.ac.frequency, values: loaded.document.ac.magnitude_db, dashed: true });
      }
    });
    const p = plot("Frequency response into the chosen destinations", series, "dB");
    if (p) plots.push(p);
  }
  if (doc?.noise) {
    const p = plot("Output noise density", [{ label: "Total output noise", colour: PLOT_COLOURS.trace, frequency: doc.noise.frequency, values: doc.noise.output_density }], "V/√Hz", true);
    if (p) plots.push(p);
  }
  const envelope = doc?.spread?.envelope;
  if (envelope && doc?.ac) {
    const p = plot(
      `Spread over the parts' tolerances (${doc.spread?.runs ?? 0} runs)`,
      [
        { label: "5th percentile", colour: PLOT_COLOURS.traceLight, frequency: envelope.frequency, values: envelope.p5_db, dashed: true },
        { label: "Nominal", colour: PLOT_COLOURS.trace, frequency: doc.ac.frequency, values: doc.ac.magnitude_db },
        { label: "95th percentile", colour: OVERLAY_COLOURS[1], frequency: envelope.frequency, values: envelope.p95_db, dashed: true },
      ],
      "dB",
    );
    if (p) plots.push(p);
  }

  const measurements: ReportModel["measurements"] = [];
  const measuredSeries: PlotSeries[] = [];
  const measuredNoiseSeries: PlotSeries[] = [];
  for (const [i, m] of measured.entries()) {
    const colour = OVERLAY_COLOURS[(i + 2) % OVERLAY_COLOURS.length];
    const base = { name: m.name, kind: m.kind === "noise_spectrum" ? "Noise spectrum" : "Frequency response", points: m.data.frequency.length, band: "20 Hz – 20 kHz" };
    const refused = (problem: string) => measurements.push({ ...base, offset: "—", maxDeviation: "—", at: "—", problem });
    if (m.kind === "noise_spectrum") {
      // noise is absolute: compared as measured, no offset (compare-noise.ts)
      if (!doc?.noise) {
        refused("No simulated noise to compare with.");
        continue;
      }
      const result = compareNoise(doc.noise, m.data, REPORT_BAND);
      if (!result.ok) {
        refused(result.message);
        continue;
      }
      const c = result.comparison;
      measurements.push({ ...base, offset: "none (absolute)", maxDeviation: c.max ? formatFixed(c.max.deviation_db, 2, "dB") : "—", at: c.max ? formatSi(c.max.frequency, "Hz") : "—" });
      measuredNoiseSeries.push({ label: `${m.name} (measured)`, colour, frequency: c.frequency, values: c.measured_dbv.map(dbvToDensity), dashed: true });
      continue;
    }
    if (!doc?.ac) {
      refused("No simulated response to compare with.");
      continue;
    }
    const result = compareMeasurement({ frequency: doc.ac.frequency, level_db: doc.ac.magnitude_db }, m.data, REPORT_BAND);
    if (!result.ok) {
      refused(result.message);
      continue;
    }
    const c = result.comparison;
    measurements.push({ ...base, offset: formatFixed(c.offset_db, 2, "dB"), maxDeviation: c.max ? formatFixed(c.max.deviation_db, 2, "dB") : "—", at: c.max ? formatSi(c.max.frequency, "Hz") : "—" });
    measuredSeries.push({ label: `${m.name} (aligned at 1 kHz)`, colour, frequency: c.frequency, values: c.measured_aligned_db, dashed: true });
  }
  if (measuredSeries.length > 0 && doc?.ac) {
    const p = plot("Measurements against simulation", [{ label: "Simulated", colour: PLOT_COLOURS.trace, frequency: doc.ac.frequency, values: doc.ac.magnitude_db }, ...measuredSeries], "dB");
    if (p) plots.push(p);
  }
  if (measuredNoiseSeries.length > 0 && doc?.noise) {
    const p = plot("Noise measurements against simulation", [{ label: "Simulated output noise", colour: PLOT_COLOURS.trace, frequency: doc.noise.frequency, values: doc.noise.output_density }, ...measuredNoiseSeries], "V/√Hz", true);
    if (p) plots.push(p);
  }

  const cautions = hazardReasons(document.circuit, doc?.op?.nets ?? null).map((r) =>
    r.kind === "triode" ? `${r.part} is a valve: its supply is lethal.` : r.kind === "supply" ? `${r.part} supplies ${Math.round(r.volts)} V.` : `Net ${r.net} sits at ${Math.round(r.volts)} V DC.`,
  );

  const file = revision.circuit as Record<string, unknown>;
  const parameters = Object.entries((file.parameters ?? {}) as Record<string, unknown>).map(([name, value]) => ({ name, value: text(value) }));
  return {
    title: design.title,
    workspaceName: membership.name,
    revisionNumber: revision.number,
    revisionMessage: revision.message,
    authorName: revision.authorName ?? "—",
    savedAt: when(new Date(revision.createdAt)),
    generatedAt: when(new Date()),
    benchUrl: `${options.origin}/w/${slug}/designs/${designId}/bench`,
    reportUrl: `${options.origin}/w/${slug}/designs/${designId}/revisions/${revisionId}/report`,
    schematic: hasStoredLayout ? schematicGeometry(document.circuit, document.layout, SCHEMATIC_FIT, document.circuit.parameters) : null,
    parameters,
    parts: document.circuit.parts.map((p) => ({
      id: p.id,
      kind: p.kind,
      values: Object.entries(p.values ?? {}).map(([k, v]) => `${k} ${text(v)}`).join(" · "),
      nets: Object.entries(p.pins ?? {}).map(([pin, net]) => `${pin}→${net}`).join(" "),
      enabled: p.enabled !== false,
    })),
    figures: [
      { label: "Sensitivity", value: formatSi(num(f.sensitivity_v_per_pa), "V/Pa") },
      { label: "Sensitivity re 1 V/Pa", value: formatFixed(num(f.sensitivity_db_re_1v_per_pa), 1, "dB") },
      { label: "Gain at 1 kHz", value: formatFixed(num(f.gain_1khz_db), 1, "dB") },
      { label: "Low corner (−3 dB)", value: formatSi(num(f.low_corner_hz), "Hz") },
      { label: "High corner (−3 dB)", value: formatSi(num(f.high_corner_hz), "Hz") },
      { label: "Output impedance at 1 kHz", value: formatSi(num(f.output_impedance_1khz_ohm), "Ω") },
      { label: "Polarity", value: typeof f.polarity === "string" ? f.polarity : "—" },
      { label: "Self-noise", value: formatFixed(num(f.self_noise_dba_spl), 1, "dB(A) SPL") },
    ],
    // as the review page prints them: the figure's name, the value and the limits with their unit
    checks: (doc?.checks ?? []).map((c) => ({
      figure: figureLabel(c.figure),
      variant: c.variant ?? "base",
      value: formatFigure(c.value, c.figure),
      range: `${c.min === undefined ? "…" : formatFigure(c.min, c.figure)} to ${c.max === undefined ? "…" : formatFigure(c.max, c.figure)}`,
      pass: c.pass,
    })),
    plots,
    measurements,
    remarks: record.remarks.map((r) => ({ author: r.authorName ?? "—", body: r.body, anchor: anchorText(r.anchor), resolved: r.resolved, reply: r.parentId !== null, at: when(r.createdAt) })),
    decisions: record.decisions.map((d) => ({ reviewer: d.reviewerName ?? "—", verdict: d.verdict, reason: d.reason, at: when(d.createdAt) })),
    reviews: record.reviews.map((r) => ({ status: r.status, message: r.message, at: when(r.createdAt) })),
    cautions,
    engineError: run.ok ? null : run.message,
  };
}
