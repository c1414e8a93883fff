/**
 * A remark anchored to a frequency band, opened from the review page, opens the bench with the magnitude plot's x
 * axis on that band: the seeded remark about 40 Hz – 120 Hz, read back from Plotly's own drawn layout.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_PASSWORD } from "../../db/demo-people";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { DEMO, Pool } from "./design-fixtures";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });

/** The drawn x range of the Bode plot, in hertz (Plotly keeps a log axis's range as log10 of the limits). */
async function drawnRangeHz(page: Page): Promise<number[]> {
  const range = await page.evaluate(() => {
    const plot = document.querySelector('[data-testid="plot-bode"] .js-plotly-plot') as (HTMLElement & { _fullLayout?: { xaxis?: { range?: number[] } } }) | null;
    return plot?._fullLayout?.xaxis?.range ?? [];
  });
  return range.map((v) => 10 ** v);
}

describe("a remark about a frequency band", () => {
  let browser: Browser;
  let page: Page;
  let path: string;

  beforeAll(async () => {
    const { rows } = await pool.query(
      "SELECT d.id AS design_id, r.id AS review_id FROM designs d JOIN reviews r ON r.design_id = d.id JOIN workspaces w ON w.id = d.workspace_id WHERE d.title = 'LA-47 studio condenser' AND w.slug = 'larkfield' ORDER BY r.created_at LIMIT 1",
    );
    path = `/w/larkfield/designs/${rows[0].design_id}`;
    browser = await openBrowser({ width: 1440, height: 1000 });
    page = await browser.context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel("E-mail").fill(DEMO.reviewer);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    await page.goto(`${baseUrl}${path}/reviews/${rows[0].review_id}`);
  });

  afterAll(async () => {
    await browser?.close();
    await pool.end();
  });

  it("opens the bench with the magnitude plot zoomed to the band", async () => {
    const group = page.getByRole("region", { name: /^40 Hz – 120 Hz$/ });
    await group.getByRole("link", { name: "Open on the bench" }).first().click();
    await page.waitForURL((url) => url.pathname.endsWith("/bench") && url.search === "?from=40&to=120");
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
    await page.locator('[data-testid="plot-bode"] .js-plotly-plot').waitFor();
    await expect(page.getByTestId("review-anchor").textContent()).resolves.toContain("40 Hz – 120 Hz");
    await expect.poll(() => drawnRangeHz(page)).toEqual([expect.closeTo(40, 6), expect.closeTo(120, 6)]);
    await page.screenshot({ path: screenshotPath("bench-remark-band-zoom"), fullPage: false });
  });

  it("shows the whole range when the bench is opened without a band", async () => {
    await page.goto(`${baseUrl}${path}/bench`);
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
    await page.locator('[data-testid="plot-bode"] .js-plotly-plot').waitFor();
    // the seeded design's sweep spans at least 20 Hz–20 kHz (the audio band), so the autoranged axis covers it
    await expect.poll(async () => {
      const [lo, hi] = await drawnRangeHz(page);
      return lo <= 20 && hi >= 20_000;
    }).toBe(true);
  });
});
