/**
 * The bench's large-signal views in Chromium on the seeded LA-47 design: a distortion run can be cancelled and run
 * again; the THD plot, the harmonic table and the maximum SPL figure appear and agree with the engine's own run
 * of the same analyses on the same revision (computed here, headless); the power-on view gives the settle time
 * the engine gives. Screenshots at 1440×900.
 */
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { formatFixed } from "@/components/bench/results/format";
import { runCircuit } from "@/sim/run";
import { findDesign, type SeededDesign, signIn } from "./bench-session";
import { type Browser, openBrowser, screenshotPath } from "./chromium";

const baseUrl = inject("baseUrl");
/** the panel's defaults: 1 kHz sine at the capsule (the design states no drive), waveform and table at 118 dB SPL */
const FREQUENCY_HZ = 1000;
const TABLE_LEVEL_DB = 118;
/** power-on run length the view defaults to (s) and its largest step (stop / 600) */
const POWER_ON_STOP_S = 30;
/**
 * Tolerances: the bench runs the same engine on the same file, so the numbers agree to the digits shown; the
 * table shows THD to 3 significant figures (half a unit in the last place ≤ 0.5 % relative), max SPL to 0.1 dB.
 */
const THD_RELATIVE_TOLERANCE = 0.005;
const SETTLE_RELATIVE_TOLERANCE = 0.01;
const RUN_TIMEOUT_MS = 240_000;

describe("bench large-signal views in Chromium", () => {
  let browser: Browser;
  let page: Page;
  let seeded: SeededDesign;

  beforeAll(async () => {
    browser = await openBrowser({ width: 1440, height: 900 });
    page = await browser.context.newPage();
    await signIn(page, baseUrl);
    seeded = await findDesign(page, baseUrl);
    await page.goto(`${baseUrl}/w/larkfield/designs/${seeded.designId}/bench`);
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 60_000 });
    await page.getByRole("tab", { name: "Large signal" }).click();
  });

  afterAll(async () => {
    await browser.close();
  });

  it("cancels a distortion run, keeping the bench usable", async () => {
    await page.getByRole("button", { name: "Run distortion" }).click();
    await page.getByTestId("distortion-progress").waitFor();
    await page.getByRole("button", { name: "Cancel" }).click();
    await page.getByTestId("distortion-cancelled").waitFor();
    await expect(page.getByTestId("harmonic-table").count()).resolves.toBe(0);
    await expect(page.getByRole("button", { name: "Run distortion" }).isEnabled()).resolves.toBe(true);
  });

  it("runs the distortion panel: THD plot, harmonic table and max SPL agree with the headless engine", { timeout: RUN_TIMEOUT_MS + 60_000 }, async () => {
    await page.getByRole("button", { name: "Run distortion" }).click();
    await page.getByTestId("harmonic-table").waitFor({ timeout: RUN_TIMEOUT_MS });
    await page.locator('[aria-label="THD against SPL"].js-plotly-plot, [aria-label="THD against SPL"] .main-svg').first().waitFor();

    const expected = runCircuit({
      ...seeded.circuit,
      analyses: { op: {}, distortion: { frequency: FREQUENCY_HZ, spl_db: [TABLE_LEVEL_DB] } },
    });
    const point = expected.distortion![0];
    const shownThd = Number.parseFloat((await page.getByTestId("harmonic-thd").textContent()) ?? "");
    expect(Math.abs(shownThd / point.thd_percent - 1)).toBeLessThan(THD_RELATIVE_TOLERANCE);
    const rows = await page.getByTestId("harmonic-table").locator("tbody tr").allTextContents();
    expect(rows).toHaveLength(9);
    expect(rows[0]).toContain(point.harmonics_db[0].toFixed(1).replace("-", "−"));

    const maxSpl = expected.figures.max_spl_db as number;
    expect(maxSpl).toBeGreaterThan(40);
    await expect(page.getByTestId("figure-max-spl").textContent()).resolves.toContain(formatFixed(maxSpl, 1, "dB SPL"));
    const limit = expected.figures.max_spl_limited_by as { part: string; reason: string; detail?: string };
    await expect(page.getByTestId("figure-max-spl").textContent()).resolves.toContain(
      `${limit.part} leaves its region: ${limit.detail ? `out of headroom, ${limit.detail}` : limit.reason}`,
    );
    await page.screenshot({ path: screenshotPath("bench-distortion") });
  });

  it("runs the power-on view and shows the engine's settle time", { timeout: RUN_TIMEOUT_MS + 60_000 }, async () => {
    await page.getByRole("button", { name: "Run power-on" }).click();
    await page.getByTestId("settle-time").waitFor({ timeout: RUN_TIMEOUT_MS });
    const expected = runCircuit({
      ...seeded.circuit,
      analyses: { op: {}, transient: { from: "power-on", stop: POWER_ON_STOP_S, step: POWER_ON_STOP_S / 600 } },
    });
    const settle = expected.figures.settle_time_s as number;
    expect(settle).toBeGreaterThan(0);
    const text = (await page.getByTestId("settle-time").textContent()) ?? "";
    const shown = Number.parseFloat(text.split(":").pop() ?? "");
    expect(Math.abs(shown / settle - 1)).toBeLessThan(SETTLE_RELATIVE_TOLERANCE);
    await page.getByTestId("power-on-panel").scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath("bench-power-on") });
  });
});
