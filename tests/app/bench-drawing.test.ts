/**
 * Drawing a front end on the bench in Chromium: a capsule, a bias resistor, a supply, a JFET follower and a load
 * dragged in from the tray and wired pin to pin, values typed into the part sheet, the figures equal to the
 * headless engine's run of the saved file, undo and redo, a saved revision that comes back after a reload, and
 * the layout looked at on a desktop and a phone.
 */
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { formatFixed } from "@/components/bench/results/format";
import { normaliseCircuit } from "@/components/bench/document/circuit";
import { canonicalPartition } from "@/components/bench/document/nets";
import { runCircuit } from "@/sim/run";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { expectClean, readWires } from "./wire-check";

const baseUrl = inject("baseUrl");
const DESIGNER = { email: "tomas@larkfield.example", password: "bench-demo-2026" };

async function signIn(page: Page) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(DESIGNER.email);
  await page.getByLabel("Password").fill(DESIGNER.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

async function dropFromTray(page: Page, item: string, x: number, y: number) {
  const canvas = page.locator("[data-bench-canvas]");
  await page.locator(`[data-tray-item="${item}"]`).dragTo(canvas, { targetPosition: { x, y } });
}

async function centre(page: Page, selector: string) {
  const box = await page.locator(selector).boundingBox();
  if (!box) throw new Error(`${selector} is not on the page`);
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

/** Drags a wire from one handle to another, as a person does. */
async function wire(page: Page, from: string, to: string) {
  const a = await centre(page, from);
  const b = await centre(page, to);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  await page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2, { steps: 5 });
  await page.mouse.move(b.x, b.y, { steps: 5 });
  await page.mouse.up();
}

interface Box {
  id: string;
  left: number;
  top: number;
  right: number;
  bottom: number;
}

/** Each canvas node's box on screen, with everything drawn outside it (the designator and value under a part). */
async function nodeBoxes(page: Page): Promise<Box[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll(".react-flow__node")].map((node) => {
      const r = node.getBoundingClientRect();
      const box = {
        id: node.getAttribute("data-id") ?? "",
        left: r.left,
        top: r.top,
        right: r.right,
        bottom: r.bottom,
      };
      for (const inner of node.querySelectorAll("*")) {
        const e = inner.getBoundingClientRect();
        if (e.width === 0 && e.height === 0) continue;
        box.left = Math.min(box.left, e.left);
        box.top = Math.min(box.top, e.top);
        box.right = Math.max(box.right, e.right);
        box.bottom = Math.max(box.bottom, e.bottom);
      }
      return box;
    }),
  );
}

/** Each canvas node's own box (the symbol's, for a part), without what is drawn outside it. */
async function nodeRects(page: Page): Promise<Box[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll(".react-flow__node")].map((node) => {
      const r = node.getBoundingClientRect();
      return { id: node.getAttribute("data-id") ?? "", left: r.left, top: r.top, right: r.right, bottom: r.bottom };
    }),
  );
}

/** The box of each part's designator and value as drawn ("R1 label"). */
async function labelBoxes(page: Page): Promise<Box[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll('[data-testid^="value-"]')].map((value) => {
      const r = (value.parentElement as HTMLElement).getBoundingClientRect();
      const id = `${value.getAttribute("data-testid")?.slice("value-".length)} label`;
      return { id, left: r.left, top: r.top, right: r.right, bottom: r.bottom };
    }),
  );
}

/** Pairs of boxes that share any area (axis-aligned boxes are apart when one is wholly beside the other). */
function overlapping(boxes: Box[]): string[] {
  const pairs: string[] = [];
  for (let i = 0; i < boxes.length; i++)
    for (let j = i + 1; j < boxes.length; j++) {
      const a = boxes[i];
      const b = boxes[j];
      if (a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom) pairs.push(`${a.id} × ${b.id}`);
    }
  return pairs;
}

const pin = (id: string) => `[data-pin="${id}"]`;
const GROUND = '[data-id="g:g1"] .react-flow__handle';

async function typeValue(page: Page, part: string, field: string, value: string) {
  await page.getByTestId(`part-${part}`).click();
  const input = page.locator(`#sheet-value-${field}`);
  await input.fill(value);
  await input.press("Enter");
}

describe("drawing on the bench", () => {
  let browser: Browser;
  let page: Page;
  let workspaceId = "";
  let designId = "";

  beforeAll(async () => {
    browser = await openBrowser({ width: 1440, height: 900 });
    page = await browser.context.newPage();
    await signIn(page);
    const api = page.context().request;
    const { workspaces } = await (await api.get(`${baseUrl}/api/workspaces`)).json();
    workspaceId = workspaces.find((w: { slug: string }) => w.slug === "larkfield").workspaceId;
    const created = await api.post(`${baseUrl}/api/workspaces/${workspaceId}/designs`, {
      data: { title: `Drawn follower ${Date.now()}` },
      headers: { origin: baseUrl }, // as the app's own pages send it (proxy.ts refuses cross-site changes)
    });
    expect(created.status()).toBe(201);
    designId = (await created.json()).design.id;
    await page.goto(`${baseUrl}/w/larkfield/designs/${designId}/bench`);
    await page.getByTestId("start-from").waitFor();
  });

  afterAll(async () => {
    await browser.close();
  });

  it("draws capsule, bias resistor, supply, JFET follower and load from the tray and wires them", async () => {
    // each drop lands its part's centre under the pointer, unless that would cover a part already there
    await dropFromTray(page, "capsule", 120, 200);
    await dropFromTray(page, "jfet", 380, 180);
    await dropFromTray(page, "resistor", 240, 380);
    await dropFromTray(page, "vsource", 620, 120);
    // below and right of the resistor, so its wire to ground leaves its b pin without crossing it
    await dropFromTray(page, "ground", 400, 600);
    for (const id of ["MIC1", "J1", "R1", "V1"]) await page.getByTestId(`part-${id}`).waitFor();
    // the load dropped onto the supply: it goes to the nearest free grid space instead of covering it
    const supply = await page.getByTestId("part-V1").boundingBox();
    await dropFromTray(page, "load", 620, 140);
    await page.getByTestId("part-IN1").waitFor();
    const load = await page.getByTestId("part-IN1").boundingBox();
    expect(supply && load).toBeTruthy();
    expect(load?.x !== supply?.x || load?.y !== supply?.y).toBe(true);
    // no two drawn items (with their labels) share any area
    const boxes = await nodeBoxes(page);
    expect(boxes).toHaveLength(6);
    expect(overlapping(boxes), JSON.stringify(boxes)).toEqual([]);

    await wire(page, pin("MIC1.diaphragm"), pin("J1.g"));
    await wire(page, pin("R1.a"), pin("J1.g"));
    await wire(page, pin("R1.b"), GROUND);
    await wire(page, pin("MIC1.backplate"), GROUND);
    await wire(page, pin("V1.p"), pin("J1.d"));
    await wire(page, pin("V1.n"), GROUND);
    await wire(page, pin("J1.s"), pin("IN1.p"));
    await wire(page, pin("IN1.n"), GROUND);
    await expect(page.locator(".react-flow__edge").count()).resolves.toBe(8);
    // each wire routed round the other parts (tests/app/wire-check.ts)
    expectClean(await readWires(page));

    // values typed as the engine reads them; the parsed value shows beside the field
    await typeValue(page, "MIC1", "electret_voltage", "100");
    await typeValue(page, "R1", "resistance", "1G");
    await expect(page.getByTestId("parsed-resistance").textContent()).resolves.toBe("= 1 GΩ");
    await typeValue(page, "IN1", "resistance", "2k2");
    await typeValue(page, "V1", "dc", "12 V");
    // an invalid value is refused at the field and never reaches the drawing
    await typeValue(page, "IN1", "resistance", "2.2 pF");
    await expect(page.locator("#sheet-value-resistance-error").textContent()).resolves.toMatch(/IN1\.resistance/);
    await expect(page.getByTestId("value-IN1").textContent()).resolves.toBe("2.2 kΩ");
    await page.locator("#sheet-value-resistance").fill("2k2");
    await page.locator("#sheet-value-resistance").press("Enter");

    // the capsule's value has grown longer than the room beside it ("50 pF · electret 100 V"): its label is cut
    // short, still holding the whole text, and no label lies over another label or another item's symbol
    await expect(page.getByTestId("value-MIC1").textContent()).resolves.toBe("50 pF · electret 100 V");
    await expect(page.locator('[data-part="MIC1"] [data-label-cut]').count()).resolves.toBe(1);
    const labels = await labelBoxes(page);
    expect(labels).toHaveLength(5);
    const symbols = (await nodeRects(page)).filter((b) => b.id.startsWith("p:"));
    expect(overlapping([...labels]), JSON.stringify(labels)).toEqual([]);
    for (const label of labels)
      for (const symbol of symbols)
        if (`p:${label.id.replace(/ label$/, "")}` !== symbol.id)
          expect(overlapping([label, symbol]), `${label.id} over ${symbol.id}`).toEqual([]);

    // the output: the follower's source
    await page.locator(".react-flow__pane").click({ position: { x: 900, y: 500 } });
    await page.getByTestId("design-sheet").waitFor();
    const sourceNet = await page.locator(pin("J1.s")).getAttribute("title");
    const net = /net (\S+)$/.exec(sourceNet ?? "")?.[1] as string;
    await page.getByLabel("+ net").selectOption(net);
    await page.screenshot({ path: screenshotPath("bench-drawn-desktop") });
  });

  it("undoes and redoes a value change from the keyboard", async () => {
    await typeValue(page, "R1", "resistance", "2G2");
    await expect(page.getByTestId("value-R1").textContent()).resolves.toBe("2.2 GΩ");
    await page.locator(".react-flow__pane").click({ position: { x: 900, y: 500 } });
    await page.keyboard.press("Control+z");
    await expect(page.getByTestId("value-R1").textContent()).resolves.toBe("1 GΩ");
    await page.keyboard.press("Control+Shift+z");
    await expect(page.getByTestId("value-R1").textContent()).resolves.toBe("2.2 GΩ");
    await page.keyboard.press("Control+z");
    await expect(page.getByTestId("value-R1").textContent()).resolves.toBe("1 GΩ");
  });

  it("saves a revision whose nets are the drawn ones, shows the engine's figures for it, and reloads it", async () => {
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByLabel("What changed?").fill("Drew a JFET follower on the bench");
    await page.getByRole("dialog").getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved as r2.").waitFor();

    const api = page.context().request;
    const { design } = await (await api.get(`${baseUrl}/api/workspaces/${workspaceId}/designs/${designId}`)).json();
    const { revision } = await (
      await api.get(`${baseUrl}/api/workspaces/${workspaceId}/designs/${designId}/revisions/${design.headRevisionId}`)
    ).json();
    const saved = normaliseCircuit(revision.circuit);
    // the drawn topology, written out by hand
    const expected = normaliseCircuit({
      format: "backplate/circuit",
      version: 1,
      parts: [
        { id: "MIC1", kind: "capsule", pins: { diaphragm: "g", backplate: "0" }, values: {} },
        { id: "J1", kind: "jfet", pins: { d: "vdd", g: "g", s: "s" }, values: {} },
        { id: "R1", kind: "resistor", pins: { a: "g", b: "0" }, values: {} },
        { id: "V1", kind: "vsource", pins: { p: "vdd", n: "0" }, values: {} },
        { id: "IN1", kind: "load", pins: { p: "s", n: "0" }, values: {} },
      ],
      output: { plus: "s", minus: "0" },
    });
    expect(canonicalPartition(saved)).toEqual(canonicalPartition(expected));
    expect(saved.parts.find((p) => p.id === "R1")?.values.resistance).toBe("1G");

    const figures = runCircuit(revision.circuit).figures;
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
    await expect(page.getByTestId("figure-sensitivity").textContent()).resolves.toContain(
      formatFixed(figures.sensitivity_db_re_1v_per_pa as number, 1, "dB re 1 V/Pa"),
    );
    expect(figures.low_corner_hz).not.toBeNull();

    await page.reload();
    await page.getByTestId("part-IN1").waitFor();
    await expect(page.getByTestId("value-IN1").textContent()).resolves.toBe("2.2 kΩ");
    await expect(page.getByText("Revision r2").count()).resolves.toBe(1);
    await expect(page.getByTestId("draft-offer").count()).resolves.toBe(0);
    // the whole bench with its results and plots, to look at
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
    await page.locator('[data-testid="plot-bode"] .js-plotly-plot').waitFor({ timeout: 30_000 });
    await page.screenshot({ path: screenshotPath("bench-saved-desktop"), fullPage: true });
  });

  it("keeps an unsaved change as a local draft across a reload and offers it back", async () => {
    await typeValue(page, "IN1", "resistance", "10k");
    await page.waitForTimeout(800);
    await page.reload();
    await page.getByTestId("draft-offer").waitFor();
    await page.getByRole("button", { name: "Restore your unsaved draft" }).click();
    await expect(page.getByTestId("value-IN1").textContent()).resolves.toBe("10 kΩ");
  });

  it("lists the shortcuts on ?", async () => {
    await page.locator(".react-flow__pane").click({ position: { x: 900, y: 500 } });
    await page.keyboard.press("?");
    await page.getByRole("dialog", { name: "Bench shortcuts" }).waitFor();
    await expect(page.getByRole("dialog").textContent()).resolves.toContain("Ctrl+Shift+Z");
    await page.keyboard.press("Escape");
  });

  it("fits a phone without sideways scrolling", async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.waitForTimeout(300);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: screenshotPath("bench-phone"), fullPage: true });
    await page.setViewportSize({ width: 1440, height: 900 });
  });
});
