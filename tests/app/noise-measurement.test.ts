/**
 * A noise-spectrum measurement on the bench, against the running app: a spectrum generated here from the design's
 * own simulated noise with a known excess is uploaded through the bench's preview, drawn over the noise density plot,
 * its difference curve shown, and the largest deviation in a chosen band equals the one computed here by hand; the
 * sign-off report lists it with its deviation over the audio band and plots it.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_WORKSPACE } from "../../db/demo-people";
import { runCircuit } from "@/sim/run";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { signIn } from "./bench-session";
import { createDemoDesign, demoCircuit, Pool } from "./design-fixtures";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });
const TITLE = `Noise trial ${Date.now()}`;
const NAME = "Rig noise, LA-47 #5";

/**
 * The "built" excess over the simulation, in dB: a higher flicker corner (400 Hz) on the same white floor, raised
 * 1.5 dB. For a density e(f) = e_w·√(1 + f_c/f) (handbook form of 1/f plus white noise) the ratio of two such spectra
 * in dB is 10·log10 of the ratio of (1 + f_c/f); here it multiplies the simulation, so measured − simulated is
 * exactly this at every measured point.
 */
const FLOOR_LIFT_DB = 1.5;
const FLICKER_CORNER_HZ = 400;
const excessDb = (f: number) => FLOOR_LIFT_DB + 10 * Math.log10(1 + FLICKER_CORNER_HZ / f);
const BAND = { fromHz: 100, toHz: 2000 };
/** The report's band: the audio band (common practice). */
const AUDIO_BAND = { fromHz: 20, toHz: 20_000 };

let browser: Browser;
let page: Page;
let designId = "";
let revisionId = "";
let csv = "";
let points: { f: number; density: number }[] = [];

/** The largest |excess| over the measured points inside [from, to], found by walking them (no project code). */
function largestIn(band: { fromHz: number; toHz: number }) {
  const inBand = points.filter((p) => p.f >= band.fromHz && p.f <= band.toHz);
  return inBand.reduce((best, p) => (Math.abs(excessDb(p.f)) > Math.abs(excessDb(best.f)) ? p : best));
}

const signed = (v: number) => `${v >= 0 ? "+" : "−"}${Math.abs(v).toFixed(2)}`;
const hz = (v: number) => (v >= 1000 ? `${(v / 1000).toPrecision(3)} kHz` : `${v.toPrecision(3)} Hz`);

beforeAll(async () => {
  ({ designId, revisionId } = await createDemoDesign(baseUrl, pool, TITLE));
  // The measured spectrum sits on the simulation's own noise frequencies, so no interpolation enters the expectation.
  const noise = runCircuit(demoCircuit()).noise;
  if (!noise) throw new Error("the demo circuit has no noise analysis");
  points = noise.frequency.map((f, i) => ({ f, density: noise.output_density[i] * 10 ** (excessDb(f) / 20) }));
  csv = `Frequency (Hz),Noise (V/√Hz)\n${points.map((p) => `${p.f},${p.density.toPrecision(12)}`).join("\n")}\n`;
  browser = await openBrowser({ width: 1440, height: 1000 });
  page = await browser.context.newPage();
  await signIn(page, baseUrl);
});

afterAll(async () => {
  await browser?.close();
  await pool.end();
});

describe("a noise spectrum on the bench", () => {
  it("uploads, overlays on the noise plot with its difference curve, and reports the hand-computed largest deviation", async () => {
    await page.goto(`${baseUrl}/w/${DEMO_WORKSPACE.slug}/designs/${designId}/bench`);
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
    await page.getByRole("tab", { name: "Measurements" }).click();
    await page.locator('[data-testid="measurement-upload"] input[type="file"]').setInputFiles({ name: "rig-noise.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await page.getByRole("table", { name: "First rows of the file" }).waitFor();
    const upload = page.getByTestId("measurement-upload");
    await upload.getByLabel("Name", { exact: true }).fill(NAME);
    await upload.getByLabel("Kind").selectOption("noise_spectrum");
    await upload.getByLabel("Level unit").selectOption("V");
    await page.getByRole("button", { name: "Save measurement" }).click();
    const table = page.getByTestId("comparison-table");
    await table.waitFor({ timeout: 15_000 });
    await expect(table.getAttribute("data-kind")).resolves.toBe("noise_spectrum");
    // a noise spectrum is compared as measured: no alignment frequency to choose, no offset applied
    await expect(page.getByLabel("Align at (Hz)").count()).resolves.toBe(0);
    await expect(page.getByTestId("offset-db").textContent()).resolves.toMatch(/^none/);

    await page.getByLabel("Band from (Hz)").fill(String(BAND.fromHz));
    await page.getByLabel("Band to (Hz)").fill(String(BAND.toHz));
    const expected = largestIn(BAND);
    await expect.poll(() => page.getByTestId("max-deviation-db").textContent()).toBe(`${signed(excessDb(expected.f))} dB`);
    await expect(page.getByTestId("max-deviation-hz").textContent()).resolves.toBe(hz(expected.f));
    await page.getByRole("img", { name: "Difference, measurement minus simulation, dB" }).waitFor();

    // the measured spectrum is one more trace on the noise density plot, in V/√Hz as uploaded
    await page.getByRole("tab", { name: "Noise", exact: true }).click();
    await page.locator('[data-testid="plot-noise"] .js-plotly-plot').waitFor();
    const traces = await page.evaluate(() => {
      const plot = document.querySelector('[data-testid="plot-noise"] .js-plotly-plot') as (HTMLElement & { data?: { name?: string; x?: number[]; y?: number[] }[] }) | null;
      return (plot?.data ?? []).map((t) => ({ name: t.name ?? "", x: Array.from(t.x ?? []), y: Array.from(t.y ?? []) }));
    });
    expect(traces.map((t) => t.name)).toContain("Total");
    const drawn = traces.find((t) => t.name === `${NAME} (measured)`);
    expect(drawn, traces.map((t) => t.name).join(", ")).toBeDefined();
    expect(drawn?.x).toEqual(points.map((p) => p.f));
    // V/√Hz back from the stored dBV/√Hz: the uploaded 12 significant digits, within a relative 1e-9
    for (const [i, v] of (drawn?.y ?? []).entries()) expect(Math.abs(v / points[i].density - 1)).toBeLessThan(1e-9);
    await page.getByTestId("measurements-panel").scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath("bench-noise-measurement-overlay"), fullPage: true });
  }, 120_000);

  it("lists the noise spectrum in the sign-off report with its largest deviation over the audio band, and plots it", async () => {
    await page.goto(`${baseUrl}/w/${DEMO_WORKSPACE.slug}/designs/${designId}/revisions/${revisionId}/report`);
    await page.getByTestId("sign-off-report").waitFor();
    const row = page.getByRole("table", { name: "Measurements against simulation" }).getByRole("row", { name: new RegExp(NAME) });
    const expected = largestIn(AUDIO_BAND);
    const text = (await row.textContent()) ?? "";
    expect(text).toContain("Noise spectrum");
    expect(text).toContain(`${excessDb(expected.f).toFixed(2)} dB`);
    expect(text).toContain("none (absolute)");
    await page.getByText("Noise measurements against simulation", { exact: true }).waitFor();
    await page.screenshot({ path: screenshotPath("sign-off-report-noise"), fullPage: true });
  });
});
