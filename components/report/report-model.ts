/**
 * The sign-off report as plain data: everything the PDF and the report page draw, already computed and formatted,
 * so both render the same record of a revision. Built on the server by app/_server/sign-off/load-report.ts.
 */
import type { PlotGeometry } from "./plot-geometry";
import type { SchematicGeometry } from "./schematic-geometry";

export interface ReportPlot {
  title: string;
  geometry: PlotGeometry;
  legend: { label: string; colour: string; dashed: boolean }[];
  note?: string;
}

export interface ReportMeasurement {
  name: string;
  kind: string;
  points: number;
  offset: string;
  maxDeviation: string;
  at: string;
  band: string;
  problem?: string;
}

export interface ReportModel {
  title: string;
  workspaceName: string;
  revisionNumber: number;
  revisionMessage: string;
  authorName: string;
  savedAt: string;
  generatedAt: string;
  benchUrl: string;
  reportUrl: string;
  schematic: SchematicGeometry | null;
  parameters: { name: string; value: string }[];
  parts: { id: string; kind: string; values: string; nets: string; enabled: boolean }[];
  figures: { label: string; value: string }[];
  checks: { figure: string; variant: string; value: string; range: string; pass: boolean }[];
  plots: ReportPlot[];
  measurements: ReportMeasurement[];
  remarks: { author: string; body: string; anchor: string; resolved: boolean; reply: boolean; at: string }[];
  decisions: { reviewer: string; verdict: "approve" | "rework"; reason: string; at: string }[];
  reviews: { status: string; message: string; at: string }[];
  cautions: string[];
  engineError: string | null;
}

/** A remark's anchor in words: a part, a net, a frequency range or a figure (the schema's four anchors). */
export function anchorText(anchor: unknown): string {
  const a = (anchor ?? {}) as Record<string, unknown>;
  if (a.type === "part") return `part ${String(a.part)}`;
  if (a.type === "net") return `net ${String(a.net)}`;
  if (a.type === "frequency") return `${String(a.fromHz)}–${String(a.toHz)} Hz`;
  if (a.type === "figure") return `figure ${String(a.figure)}`;
  return "the revision";
}
