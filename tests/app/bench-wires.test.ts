/**
 * Wires on the bench in Chromium: on the seeded demo design and on a starting point, every wire is drawn as
 * horizontal and vertical runs from handle to handle, and none passes through a drawn item other than the two it
 * joins (its path sampled with getPointAtLength and held against every node's box and the boxes of everything drawn
 * in it, labels included, in screen coordinates); two nets never run along one line; a value edit moves no wire. Screenshots at 1440×900 to look at.
 */
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { findDesign, signIn } from "./bench-session";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { originHeader } from "./http-session";
import { expectClean, readWires } from "./wire-check";

const baseUrl = inject("baseUrl");

describe("wires on the bench", () => {
  let browser: Browser;
  let page: Page;

  beforeAll(async () => {
    browser = await openBrowser({ width: 1440, height: 900 });
    page = await browser.context.newPage();
    await signIn(page, baseUrl);
  });

  afterAll(async () => {
    await browser.close();
  });

  it("draws the demo design's wires round every part, ground symbol and label", async () => {
    const seeded = await findDesign(page, baseUrl);
    await page.goto(`${baseUrl}/w/larkfield/designs/${seeded.designId}/bench`);
    await page.locator(".react-flow__edge").first().waitFor({ state: "attached" }); // a straight vertical wire has no width, so is never "visible"
    await page.waitForTimeout(300);
    const wires = await readWires(page);
    expectClean(wires);
    await page.screenshot({ path: screenshotPath("bench-wires-demo") });

    // a value edit leaves every route as it was
    const before = await page
      .locator(".react-flow__edge path.react-flow__edge-path")
      .evaluateAll((paths) => paths.map((p) => p.getAttribute("d")));
    await page.getByTestId("part-RG").click();
    const input = page.locator("#sheet-value-resistance");
    await input.fill("2G2");
    await input.press("Enter");
    await expect(page.getByTestId("value-RG").textContent()).resolves.toBe("2.2 GΩ");
    const after = await page
      .locator(".react-flow__edge path.react-flow__edge-path")
      .evaluateAll((paths) => paths.map((p) => p.getAttribute("d")));
    expect(after).toEqual(before);

    // a wire is picked by clicking anywhere along its route, and then drawn in the selected style
    const middle = await page
      .locator('.react-flow__edge[data-id="w21"] path.react-flow__edge-path')
      .evaluate((path) => {
        const p = path as SVGPathElement;
        const at = p.getPointAtLength(p.getTotalLength() / 2);
        const s = new DOMPoint(at.x, at.y).matrixTransform(p.getScreenCTM() as DOMMatrix);
        return { x: s.x, y: s.y };
      });
    await page.mouse.click(middle.x, middle.y);
    await expect
      .poll(() => page.locator('.react-flow__edge[data-id="w21"]').getAttribute("class"))
      .toContain("selected");
    // the selected style of canvas.css: a wider stroke
    const width = await page
      .locator('.react-flow__edge[data-id="w21"] path.react-flow__edge-path')
      .evaluate((p) => getComputedStyle(p).strokeWidth);
    expect(width).toBe("2.4px");

    // the whole drawing (the readable fit leaves part of it off screen), to look at the routes together
    for (let i = 0; i < 3; i++) await page.locator(".react-flow__controls-zoomout").click();
    await page.waitForTimeout(300);
    expectClean(await readWires(page));
    await page.screenshot({ path: screenshotPath("bench-wires-demo-whole") });
  });

  it("draws a starting point's wires round every item", async () => {
    const api = page.context().request;
    const { workspaces } = await (await api.get(`${baseUrl}/api/workspaces`)).json();
    const workspaceId = workspaces.find((w: { slug: string }) => w.slug === "larkfield").workspaceId;
    const created = await api.post(`${baseUrl}/api/workspaces/${workspaceId}/designs`, {
      data: { title: `Wired start ${Date.now()}` },
      headers: originHeader(baseUrl),
    });
    expect(created.status()).toBe(201);
    const designId = (await created.json()).design.id;
    await page.goto(`${baseUrl}/w/larkfield/designs/${designId}/bench`);
    await page.getByTestId("start-from").waitFor();
    await page.getByRole("button", { name: /Valve impedance converter, output transformer/ }).click();
    await page.locator(".react-flow__edge").first().waitFor({ state: "attached" }); // a straight vertical wire has no width, so is never "visible"
    await page.locator("[data-bench-canvas]").focus();
    await page.keyboard.press("f");
    await page.waitForTimeout(300);
    expectClean(await readWires(page));
    await page.screenshot({ path: screenshotPath("bench-wires-start") });
    for (let i = 0; i < 2; i++) await page.locator(".react-flow__controls-zoomout").click();
    await page.waitForTimeout(300);
    expectClean(await readWires(page));
    await page.screenshot({ path: screenshotPath("bench-wires-start-whole") });
  });
});
