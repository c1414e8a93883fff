/**
 * Wires on the bench in Chromium: on the seeded demo design and on a starting point, every wire is drawn as
 * horizontal and vertical runs from handle to handle, and none passes through a drawn item other than the two it
 * joins (its path sampled with getPointAtLength and held against every node's box and the boxes of everything drawn
 * in it, labels included, in screen coordinates); two nets never run along one line; a value edit moves no wire. Screenshots at 1440×900 to look at.
 */
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { originHeader } from "./http-session";
import { findDesign, signIn } from "./bench-session";

const baseUrl = inject("baseUrl");

interface WireReport {
  id: string;
  net: string;
  routed: boolean;
  /** what each wire passes through: "<wire> × <node> at x,y" */
  crossings: string[];
  /** distance (px on screen) from each end of the path to the nearest handle centre of the node it joins */
  endGaps: number[];
  /** sampled points in canvas units, rounded, for the overlap check */
  points: string[];
  /** segments that are neither horizontal nor vertical */
  slanted: number;
}

/** Reads every wire from the page and checks it against every node's box (the node and all drawn inside it). */
async function readWires(page: Page): Promise<WireReport[]> {
  return page.evaluate(() => {
    // each node's own box and the box of everything drawn in it (the designator and value under a part reach
    // outside the symbol): a wire may pass beside a small symbol under which a wide label sits, never through either
    const boxes = [...document.querySelectorAll(".react-flow__node")].flatMap((node) => {
      const id = node.getAttribute("data-id") ?? "";
      return [node, ...node.querySelectorAll("*")]
        .map((e) => e.getBoundingClientRect())
        .filter((r) => r.width > 0 && r.height > 0)
        .map((r) => ({ id, left: r.left, top: r.top, right: r.right, bottom: r.bottom }));
    });
    const handleCentres = (nodeId: string) =>
      [...document.querySelectorAll(`.react-flow__node[data-id="${nodeId}"] .react-flow__handle`)].map((h) => {
        const r = h.getBoundingClientRect();
        return { x: r.left + r.width / 2, y: r.top + r.height / 2 };
      });
    return [...document.querySelectorAll(".react-flow__edge")].map((edge) => {
      const path = edge.querySelector("path.react-flow__edge-path") as SVGPathElement;
      const from = edge.getAttribute("data-from") ?? "";
      const to = edge.getAttribute("data-to") ?? "";
      const matrix = path.getScreenCTM() as DOMMatrix;
      const total = path.getTotalLength();
      const crossings: string[] = [];
      const points = new Set<string>();
      for (let at = 0; at <= total; at += 1) {
        const p = path.getPointAtLength(at);
        points.add(`${Math.round(p.x)},${Math.round(p.y)}`);
        const s = new DOMPoint(p.x, p.y).matrixTransform(matrix);
        for (const b of boxes) {
          if (b.id === from || b.id === to) continue;
          // strictly inside by more than a pixel (a stroke grazing an edge is not through it)
          if (s.x > b.left + 1 && s.x < b.right - 1 && s.y > b.top + 1 && s.y < b.bottom - 1)
            crossings.push(`${edge.getAttribute("data-id")} × ${b.id} at ${Math.round(s.x)},${Math.round(s.y)}`);
        }
      }
      const ends = [path.getPointAtLength(0), path.getPointAtLength(total)].map((p) =>
        new DOMPoint(p.x, p.y).matrixTransform(matrix),
      );
      const endGaps = [
        [ends[0], from],
        [ends[1], to],
      ].map(([p, node]) => {
        const { x, y } = p as DOMPoint;
        return Math.min(...handleCentres(node as string).map((h) => Math.hypot(h.x - x, h.y - y)));
      });
      // the path is "M x y L x y …": consecutive corners share x or y
      const numbers = (path.getAttribute("d") ?? "").match(/-?\d+(\.\d+)?/g)?.map(Number) ?? [];
      let slanted = 0;
      for (let i = 2; i + 1 < numbers.length; i += 2)
        if (numbers[i] !== numbers[i - 2] && numbers[i + 1] !== numbers[i - 1]) slanted++;
      return {
        id: edge.getAttribute("data-id") ?? "",
        net: (edge.getAttribute("aria-label") ?? "").replace(/^wire on net /, ""),
        routed: path.getAttribute("data-routed") === "yes",
        crossings: [...new Set(crossings.map((c) => c.replace(/ at .*/, "")))].slice(0, 5),
        endGaps,
        points: [...points],
        slanted,
      };
    });
  });
}

/** Pairs of wires on different nets that share more than a crossing's worth of points (they run along each other). */
function sharedRuns(wires: WireReport[]): string[] {
  const found: string[] = [];
  for (let i = 0; i < wires.length; i++)
    for (let j = i + 1; j < wires.length; j++) {
      if (wires[i].net === wires[j].net) continue;
      const mine = new Set(wires[i].points);
      const shared = wires[j].points.filter((p) => mine.has(p)).length;
      // a crossing shares about one point; running together shares one per unit of length
      if (shared > 4) found.push(`${wires[i].id} (${wires[i].net}) and ${wires[j].id} (${wires[j].net}): ${shared}`);
    }
  return found;
}

function expectClean(wires: WireReport[]) {
  expect(wires.length).toBeGreaterThan(5);
  for (const wire of wires) {
    expect(wire.routed, `${wire.id} found no clear way`).toBe(true);
    expect(wire.crossings, wire.id).toEqual([]);
    expect(wire.slanted, `${wire.id} has a slanted segment`).toBe(0);
    // each end sits on a handle of the node it joins (the route's geometry is the drawing's)
    for (const gap of wire.endGaps) expect(gap, wire.id).toBeLessThan(1.5);
  }
  expect(sharedRuns(wires)).toEqual([]);
}

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
