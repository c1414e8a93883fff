import { gzipSync } from "node:zlib";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { type Browser, openBrowser, screenshotPath } from "./chromium";

const baseUrl = inject("baseUrl");
/** Issue 6: the landing page's first-load JavaScript stays under 200 kB gzipped. */
const FIRST_LOAD_BUDGET_BYTES = 200_000;
/** the class Plotly gives every graph it draws, and the one React Flow gives its canvas: in their code only */
const PLOTLY_MARK = "js-plotly-plot";
const REACT_FLOW_MARK = "react-flow__pane";

describe("landing page in Chromium", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser.close();
  });

  it("shows the heading in the shipped display font and saves desktop and phone screenshots", async () => {
    const page = await browser.context.newPage();
    await page.goto(baseUrl);
    const heading = page.getByRole("heading", { level: 1 });
    await expect(heading.textContent()).resolves.toContain("Sign off the front end");
    await page.evaluate(() => document.fonts.ready);

    // The heading's first font family is the one next/font generated from the woff2 shipped in app/fonts/.
    const family = await heading.evaluate((el) => getComputedStyle(el).fontFamily.split(",")[0].trim());
    expect(family).toMatch(/display/i);
    const loaded = await page.evaluate((f) => {
      const faces = [...document.fonts].filter((face) => face.family.replace(/['"]/g, "") === f.replace(/['"]/g, ""));
      return { check: document.fonts.check(`700 48px ${f}`), status: faces.map((face) => face.status) };
    }, family);
    expect(loaded.check).toBe(true);
    expect(loaded.status).toContain("loaded");

    // The header carries the product name and the navigation; the footer carries the caution.
    await expect(page.getByRole("navigation", { name: "Main" }).isVisible()).resolves.toBe(true);
    await expect(page.locator("footer").textContent()).resolves.toMatch(/electrical codes/);

    await page.screenshot({ path: screenshotPath("landing-desktop"), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: screenshotPath("landing-phone"), fullPage: true });
    await page.close();
  });

  it("loads under 200 kB of gzipped JavaScript on first load, with neither Plotly nor React Flow (issue 6 target)", async () => {
    // The budget counts every script the landing page fetches, each gzipped here at zlib's default level (what a
    // server's gzip typically sends); Plotly and React Flow are recognised by class names only their code writes.
    const page = await browser.context.newPage();
    const scripts: { url: string; body: Buffer }[] = [];
    page.on("response", async (response) => {
      if (response.request().resourceType() !== "script") return;
      scripts.push({ url: response.url(), body: await response.body() });
    });
    await page.goto(baseUrl, { waitUntil: "networkidle" });
    await page.waitForTimeout(500);
    expect(scripts.length).toBeGreaterThan(0);
    const gzippedBytes = scripts.reduce((sum, s) => sum + gzipSync(s.body).length, 0);
    console.log(
      `landing first-load JavaScript: ${scripts.length} scripts, ${(gzippedBytes / 1000).toFixed(1)} kB gzipped`,
    );
    expect(gzippedBytes).toBeLessThan(FIRST_LOAD_BUDGET_BYTES);
    for (const s of scripts) {
      const text = s.body.toString("utf8");
      expect(text.includes(PLOTLY_MARK), `${s.url} carries Plotly`).toBe(false);
      expect(text.includes(REACT_FLOW_MARK), `${s.url} carries React Flow`).toBe(false);
    }
    await page.close();
  });

  it("serves the health check from the running app", async () => {
    const response = await fetch(`${baseUrl}/api/health`);
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.status).toBe("ok");
    expect(body.database.roundTripMs).toBeGreaterThanOrEqual(0);
  });

  it("names its icon and serves it and robots.txt from public/ (no request for a missing /favicon.ico)", async () => {
    const page = await browser.context.newPage();
    const missing: string[] = [];
    page.on("response", (response) => {
      if (response.status() >= 400) missing.push(`${response.status()} ${response.url()}`);
    });
    await page.goto(`${baseUrl}/`);
    const icon = await page.locator('link[rel="icon"]').getAttribute("href");
    expect(icon).toMatch(/^\/backplate-mark\.svg/);
    const served = await fetch(`${baseUrl}${icon}`);
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toContain("image/svg+xml");
    const robots = await fetch(`${baseUrl}/robots.txt`);
    expect(robots.status).toBe(200);
    expect(await robots.text()).toContain("Disallow: /");
    expect(missing).toEqual([]);
    await page.close();
  });
});
