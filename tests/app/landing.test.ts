import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { type Browser, openBrowser, screenshotPath } from "./chromium";

const baseUrl = inject("baseUrl");

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

  it("serves the health check from the running app", async () => {
    const response = await fetch(`${baseUrl}/api/health`);
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.status).toBe("ok");
    expect(body.database.roundTripMs).toBeGreaterThanOrEqual(0);
  });
});
