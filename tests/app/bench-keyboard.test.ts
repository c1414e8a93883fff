/**
 * The bench by keyboard alone: Tab reaches a part on the canvas, Enter selects it and moves into its part sheet,
 * a value typed there and confirmed with Enter changes the drawing and the live figures.
 */
import { originHeader } from "./http-session";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { EXTERNALLY_POLARISED_JFET } from "@/components/bench/starting-points/circuits";
import { DEMO_PASSWORD } from "../../db/demo-people";
import { lowCornerHz } from "./bench-figures";
import { type Browser, openBrowser, screenshotPath } from "./chromium";

const baseUrl = inject("baseUrl");
/** More presses than the page has stops before the canvas's parts (header, top bar, tray, then the parts). */
const MAX_TABS = 200;

/** Presses Tab until the focused element sits in the canvas node of `partId`; the number of presses it took. */
async function tabToPart(page: Page, partId: string): Promise<number> {
  for (let presses = 1; presses <= MAX_TABS; presses++) {
    await page.keyboard.press("Tab");
    const there = await page.evaluate((id) => {
      const node = document.activeElement?.closest(".react-flow__node");
      return Boolean(node?.querySelector(`[data-testid="part-${id}"]`));
    }, partId);
    if (there) return presses;
  }
  throw new Error(`Tab never reached part ${partId} in ${MAX_TABS} presses`);
}

describe("the bench by keyboard", () => {
  let browser: Browser;
  let page: Page;

  beforeAll(async () => {
    browser = await openBrowser();
    page = await browser.context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel("E-mail").first().fill("tomas@larkfield.example");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByLabel("Password").press("Enter");
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    const api = page.context().request;
    const { workspaces } = await (await api.get(`${baseUrl}/api/workspaces`)).json();
    const workspaceId = workspaces.find((w: { slug: string }) => w.slug === "larkfield").workspaceId;
    const created = await api.post(`${baseUrl}/api/workspaces/${workspaceId}/designs`, {
      data: { title: `Keyboard follower ${Date.now()}`, circuit: EXTERNALLY_POLARISED_JFET },
      headers: originHeader(baseUrl),
    });
    expect(created.status()).toBe(201);
    const designId = (await created.json()).design.id;
    await page.goto(`${baseUrl}/w/larkfield/designs/${designId}/bench`);
    await page.getByTestId("part-C2").waitFor();
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
  });

  afterAll(async () => {
    await browser.close();
  });

  it("tabs to a part, selects it with Enter, types a value in its sheet and sees the figures follow", async () => {
    const before = await page.getByTestId("figure-low").textContent();
    await page.locator("body").focus();
    const presses = await tabToPart(page, "C2");
    console.info(`Tab presses from the top of the bench page to part C2: ${presses}`);
    await page.keyboard.press("Enter");
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("sheet-value-capacitance");
    await expect(page.getByTestId("part-sheet").locator("#sheet-id").inputValue()).resolves.toBe("C2");
    await page.keyboard.press("ControlOrMeta+a");
    await page.keyboard.type("1u");
    await page.keyboard.press("Enter");
    await expect(page.getByTestId("value-C2").textContent()).resolves.toBe("1 µF");
    // 22 µF → 1 µF into 2.4 kΩ: a first-order high-pass, f = 1/(2π R C) (handbook); the follower's
    // output resistance (below its 2.2 kΩ source resistor) adds to R, so the corner lies between these bounds
    await expect.poll(() => lowCornerHz(page), { timeout: 30_000 }).toBeGreaterThan(1 / (2 * Math.PI * 4600 * 1e-6));
    const after = await lowCornerHz(page);
    expect(after).toBeLessThan(1 / (2 * Math.PI * 2400 * 1e-6));
    expect(await page.getByTestId("figure-low").textContent()).not.toBe(before);
    await page.screenshot({ path: screenshotPath("bench-keyboard-value") });
  });
});
