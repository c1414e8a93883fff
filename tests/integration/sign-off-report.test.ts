/**
 * The sign-off report rendered to PDF from a real revision (the demo circuit with its layout) and a measurement,
 * its pages turned into PNG images with pdftoppm (poppler-utils) for a person to look at, and its text checked with
 * pdftotext: every section is there and the measurement's deviation is the one computed here by hand.
 */
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { uploadMeasurement } from "@/app/_server/measurement-upload";
import { loadReport } from "@/app/_server/sign-off/load-report";
import { renderReportPdf } from "@/app/_server/sign-off/report-pdf";
import { openDocument } from "@/components/bench/document/document";
import { createDesign } from "@/db/designs";
import { saveRevision } from "@/db/revisions";
import { getMembership } from "@/db/memberships";
import { runCircuit } from "@/sim/run";
import { demoCircuit, makeUser, makeWorkspace } from "./design-fixtures";
import { sweepCsv } from "./storage-client";

const OUT = path.resolve("tests/output/report");
let pdf: Buffer;
/**
 * A measured noise spectrum's excess over the simulation, dB: a flicker corner of 400 Hz on the same floor, raised
 * 1.5 dB (handbook form e_w·√(1 + f_c/f) of 1/f plus white noise). It falls with f, so over the audio band its
 * largest value lies at the lowest measured point, 20 Hz.
 */
const noiseExcessDb = (f: number) => 1.5 + 10 * Math.log10(1 + 400 / f);

beforeAll(async () => {
  const userId = await makeUser("Ines Caldero");
  const workspaceId = await makeWorkspace({ [userId]: "designer" });
  const circuit = demoCircuit();
  // the bench's own automatic layout, saved with the revision as the bench saves it
  const layout = openDocument(circuit).layout as unknown as Record<string, unknown>;
  const created = await createDesign(workspaceId, userId, { title: "Larkfield LA-7 front end", circuit, message: "First build" });
  const designId = created.designId;
  const { id: revisionId } = await saveRevision(workspaceId, designId, userId, { parentRevisionId: created.revisionId, circuit, layout, message: "Drawn on the bench" });
  await uploadMeasurement({
    workspaceId, designId, userId, filename: "bench-sweep.csv", bytes: new TextEncoder().encode(sweepCsv(50, 6).csv),
    mappingJson: JSON.stringify({ kind: "frequency_response", name: "Bench sweep", frequencyColumn: 0, levelColumn: 1, phaseColumn: null, frequencyUnit: "Hz", levelUnit: "dB" }),
    revisionId,
  });
  // the spectrum sits on the simulation's own noise frequencies, in V/√Hz, so the expectation needs no interpolation
  const noise = runCircuit(circuit).noise;
  if (!noise) throw new Error("the demo circuit has no noise analysis");
  const noiseLines = noise.frequency.map((f, i) => `${f},${(noise.output_density[i] * 10 ** (noiseExcessDb(f) / 20)).toPrecision(12)}`);
  await uploadMeasurement({
    workspaceId, designId, userId, filename: "rig-noise.csv", bytes: new TextEncoder().encode(`Frequency (Hz),Noise (V/rtHz)\n${noiseLines.join("\n")}\n`),
    mappingJson: JSON.stringify({ kind: "noise_spectrum", name: "Rig noise", frequencyColumn: 0, levelColumn: 1, phaseColumn: null, frequencyUnit: "Hz", levelUnit: "V" }),
    revisionId,
  });
  const membership = await getMembership(workspaceId, userId);
  if (!membership) throw new Error("no membership");
  const report = await loadReport(membership, designId, revisionId, { origin: "http://127.0.0.1:3000" });
  expect(report.plots.length).toBeGreaterThanOrEqual(2);
  pdf = await renderReportPdf(report);
  fs.rmSync(OUT, { recursive: true, force: true });
  fs.mkdirSync(OUT, { recursive: true });
  fs.writeFileSync(path.join(OUT, "report.pdf"), pdf);
});

describe("sign-off report PDF", () => {
  it("is a PDF whose pages pdftoppm turns into images", () => {
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    execFileSync("pdftoppm", ["-png", "-r", "110", path.join(OUT, "report.pdf"), path.join(OUT, "page")]);
    const pages = fs.readdirSync(OUT).filter((f) => f.startsWith("page") && f.endsWith(".png"));
    expect(pages.length).toBeGreaterThanOrEqual(2);
  });

  it("holds every section", () => {
    const text = execFileSync("pdftotext", ["-layout", path.join(OUT, "report.pdf"), "-"]).toString();
    for (const heading of ["SIGN-OFF REPORT", "Circuit", "Figures", "Target checks", "Parameters and parts", "Plots", "Measurements against simulation", "Remarks", "Decisions", "/bench"]) {
      expect(text).toContain(heading);
    }
    expect(text).toContain("Bench sweep");
    expect(text).toMatch(/Larkfield LA-7 front end r2 · generated/);
  });

  it("lists the noise spectrum with the hand-computed largest deviation, compared as measured, and plots it", () => {
    const text = execFileSync("pdftotext", ["-layout", path.join(OUT, "report.pdf"), "-"]).toString();
    // the table row, not the plot legend ("Rig noise (measured)")
    const row = text.split("\n").find((line) => line.includes("Rig noise") && !line.includes("(measured)")) ?? "";
    expect(row).toContain("Noise spectrum");
    expect(row).toContain("none (absolute)");
    expect(row).toContain(`${noiseExcessDb(20).toFixed(2)} dB`);
    expect(text).toContain("Noise measurements against simulation");
  });

  it("numbers every page 'Page N of M' in its footer, beside the design name and revision", () => {
    const info = execFileSync("pdfinfo", [path.join(OUT, "report.pdf")]).toString();
    const total = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
    expect(total).toBeGreaterThanOrEqual(2);
    for (let page = 1; page <= total; page++) {
      const text = execFileSync("pdftotext", ["-f", String(page), "-l", String(page), "-layout", path.join(OUT, "report.pdf"), "-"]).toString();
      expect(text).toContain(`Page ${page} of ${total}`);
      expect(text).toContain("Larkfield LA-7 front end r2");
    }
  });

  it("labels each drawn part with its id and key value, as the bench does", () => {
    // the first page holds the circuit picture: every part of the demo circuit is named there
    const firstPage = execFileSync("pdftotext", ["-f", "1", "-l", "1", path.join(OUT, "report.pdf"), "-"]).toString();
    for (const part of demoCircuit().parts as { id: string }[]) expect(firstPage).toContain(part.id);
    // the bias resistor's key value as the bench's formatter writes it, spelt for the PDF's standard fonts
    expect(firstPage).toMatch(/G ohm/);
  });
});
