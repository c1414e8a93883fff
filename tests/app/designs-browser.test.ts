import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_WORKSPACE } from "../../db/demo-people";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { Pool, withParameter } from "./design-fixtures";

const baseUrl = inject("baseUrl");
const DESIGN = "LA-47 studio condenser";
const PHONE = { width: 390, height: 844 };
const pool = new Pool({ connectionString: inject("databaseUrl") });

async function signIn(page: Page, email: string) {
  await page.goto(`${baseUrl}/sign-in?callbackUrl=/w/${DEMO_WORKSPACE.slug}`);
  await page.getByLabel("E-mail").first().fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL(`${baseUrl}/w/${DEMO_WORKSPACE.slug}`);
}

/** Full-page screenshots from the top, so the sticky header sits where it belongs. */
async function shoot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: screenshotPath(name), fullPage: true });
}

/** Nothing wider than the viewport (no sideways scrolling of the page itself). */
async function expectNoOverflow(page: Page) {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(0);
}

async function openDesignFromTable(page: Page) {
  await page.getByLabel("Search titles").fill("LA-47");
  const link = page.getByRole("link", { name: DESIGN });
  await link.waitFor();
  await expect.poll(() => page.getByRole("row").count()).toBe(2); // header + the one match, once the search applies
  await link.click();
  await page.getByRole("heading", { level: 1, name: DESIGN }).waitFor();
}

describe("designs in Chromium", () => {
  let browser: Browser;
  let linkAddress = "";
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser.close();
    await pool.end();
  });

  it("the demo reviewer opens a design from the table, sees its history and what changed, and cannot save", async () => {
    const page = await browser.context.newPage();
    await signIn(page, "margit@larkfield.example");
    await page.getByRole("heading", { level: 1, name: "Designs" }).waitFor();
    // the table's and the header's links to per-request pages are not prefetched (components/ui/page-link.tsx):
    // a prefetch of each would cost the server about a page's render on every view of the list
    const prefetches: string[] = [];
    page.on("request", (r) => {
      if (r.headers()["next-router-prefetch"]) prefetches.push(r.url());
    });
    // Other app tests add designs to the same workspace, so the demo design may be on a later page: wait for rows
    // of designs (each holds a link to its design; the "Loading designs…" row holds none)
    await expect.poll(() => page.locator("tbody tr a").count(), { timeout: 30_000 }).toBeGreaterThan(0);
    await expect(page.getByRole("button", { name: "New design" }).count()).resolves.toBe(0);
    await page.waitForTimeout(1000); // Next.js prefetches links once they have been in view a moment
    expect(prefetches).toEqual([]);
    await shoot(page, "designs-table-desktop");
    await page.setViewportSize(PHONE);
    await expectNoOverflow(page);
    await shoot(page, "designs-table-phone");
    await page.setViewportSize({ width: 1440, height: 900 });

    await openDesignFromTable(page);
    const history = page.getByRole("list", { name: "Revisions, newest first" });
    await expect(history.getByRole("listitem").count()).resolves.toBeGreaterThanOrEqual(4);
    await expect(history.textContent()).resolves.toContain("Bias resistors 1G → 2G2 for a lower corner");
    await expect(history.textContent()).resolves.toContain("Ines Caldero");
    const changed = page.getByRole("region", { name: /What changed in r\d+/ });
    await expect(changed.textContent()).resolves.toMatch(/RB\s*1G\s*→\s*2G2/);
    const figures = page.getByRole("region", { name: "Figures" });
    await expect(figures.textContent()).resolves.toMatch(/Sensitivity.*mV\/Pa/);
    await page.getByRole("img", { name: /Magnitude of the output/ }).waitFor();
    // No save form for a reviewer, and the server refuses a save sent anyway.
    await expect(page.getByRole("form", { name: "Save a revision" }).count()).resolves.toBe(0);
    await expect(page.getByText(/saving is for designers and owners/).isVisible()).resolves.toBe(true);
    const status = await page.evaluate(async () => {
      const href = document.querySelector("a[href*='/export']")!.getAttribute("href")!;
      const base = href.slice(0, href.indexOf("/revisions/"));
      const response = await fetch(`${base}/revisions`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ parentRevisionId: null, circuit: {}, message: "sneaky" }),
      });
      return response.status;
    });
    expect(status).toBe(403);
    await shoot(page, "design-page-reviewer-desktop");
    await page.close();
  });

  it("a designer saves a revision by pasting a circuit file, and makes a public bench link", async () => {
    const designer = await openBrowser();
    try {
      const page = await designer.context.newPage();
      await signIn(page, "tomas@larkfield.example");
      await openDesignFromTable(page);
      const before = await page.getByRole("list", { name: "Revisions, newest first" }).getByRole("listitem").count();
      const form = page.getByRole("form", { name: "Save a revision" });
      // A malformed file first: the message says what to fix and nothing is saved.
      await form.getByLabel("…or paste the circuit file").fill("{ this is not json");
      await form.getByLabel("What changed").fill("Broken paste");
      await form.getByRole("button", { name: "Save revision" }).click();
      await form.getByText(/not valid JSON/).waitFor();
      await form.getByLabel("…or paste the circuit file").fill(JSON.stringify(withParameter("RS", "3k3")));
      await form.getByLabel("What changed").fill("Source resistor to 3k3 from the browser");
      await form.getByRole("button", { name: "Save revision" }).click();
      await form.getByText(/Saved as r\d+/).waitFor();
      const history = page.getByRole("list", { name: "Revisions, newest first" });
      await history.getByText("Source resistor to 3k3 from the browser").waitFor();
      await expect(history.getByRole("listitem").count()).resolves.toBe(before + 1);
      await shoot(page, "design-page-desktop");
      await page.setViewportSize(PHONE);
      await expectNoOverflow(page);
      await shoot(page, "design-page-phone");
      await page.setViewportSize({ width: 1440, height: 900 });

      const links = page.getByRole("form", { name: "Make a bench link" });
      await links.getByLabel("Variant").selectOption("pad");
      await links.getByLabel("From (Hz)").fill("20");
      await links.getByLabel("To (Hz)").fill("20000");
      await links.getByLabel("Label").fill("For the review meeting");
      await links.getByLabel("Opens without signing in").check();
      await links.getByRole("button", { name: "Make bench link" }).click();
      linkAddress = (await page.getByTestId("new-bench-link").textContent()) ?? "";
      expect(linkAddress).toMatch(/\/b\/[A-Za-z0-9_-]{43}$/);
      await page.getByText("For the review meeting").waitFor();
      await page.close();
    } finally {
      await designer.close();
    }
  });

  it("a designer starts a design from a starting point on the new-design form, and its bench opens with that circuit", async () => {
    const designer = await openBrowser();
    try {
      const page = await designer.context.newPage();
      await signIn(page, "tomas@larkfield.example");
      const title = `Valve and follower ${Date.now()}`;
      await page.getByRole("button", { name: "New design" }).click();
      const form = page.getByRole("form", { name: "New design" });
      await form.getByLabel("Title", { exact: true }).fill(title);
      await form.getByRole("radio", { name: /Valve with a bipolar follower/ }).check();
      await shoot(page, "new-design-starting-point");
      await form.getByRole("button", { name: "Create design" }).click();
      await page.waitForURL(/\/w\/larkfield\/designs\/[0-9a-f-]+$/);
      await page.getByRole("heading", { level: 1, name: title }).waitFor();
      await expect(page.getByRole("list", { name: "Revisions, newest first" }).textContent()).resolves.toContain("Started from “Valve with a bipolar follower”");

      await page.getByRole("link", { name: "Open the bench" }).click();
      await page.waitForURL(/\/bench$/);
      await page.locator("[data-part]").first().waitFor();
      // What was stored: the head revision's circuit and its drawing, read straight from PostgreSQL.
      const { rows } = await pool.query(
        "SELECT r.circuit, r.layout FROM designs d JOIN design_revisions r ON r.id = d.head_revision_id WHERE d.title = $1",
        [title],
      );
      expect(rows).toHaveLength(1);
      const parts = rows[0].circuit.parts as { id: string; kind: string }[];
      // The topology as the trade names it (common practice): a triode stage, a bipolar follower after it, and the
      // destination it drives.
      expect(parts.map((p) => p.kind)).toEqual(expect.arrayContaining(["triode", "bjt", "load"]));
      expect(Object.keys(rows[0].layout.parts ?? {}).sort()).toEqual(parts.map((p) => p.id).sort());
      // Every part is drawn on the bench, and nothing else; a bench with parts does not offer "Start from…".
      await expect
        .poll(() => page.locator("[data-part]").evaluateAll((nodes) => nodes.map((n) => n.getAttribute("data-part") ?? "").sort()))
        .toEqual(parts.map((p) => p.id).sort());
      await expect(page.getByTestId("start-from").count()).resolves.toBe(0);
      await page.close();
    } finally {
      await designer.close();
    }
  });

  it("the bench link opens in a fresh browser without signing in, showing the revision, figures, parts and view", async () => {
    expect(linkAddress).not.toBe("");
    const stranger = await openBrowser();
    try {
      const page = await stranger.context.newPage();
      const response = await page.goto(linkAddress);
      expect(response?.status()).toBe(200);
      await page.getByRole("heading", { level: 1, name: DESIGN }).waitFor();
      await expect(page.getByText("Bench link · read-only").isVisible()).resolves.toBe(true);
      await expect(page.getByRole("list", { name: "The view this link opens" }).textContent()).resolves.toMatch(/Variant: pad.*Range: 20–20000 Hz/);
      await expect(page.getByRole("region", { name: "Figures" }).textContent()).resolves.toMatch(/mV\/Pa/);
      await expect(page.getByRole("region", { name: "Parts" }).textContent()).resolves.toContain("RSRC");
      await page.getByRole("img", { name: /variant “pad”, 20–20000 Hz/ }).waitFor();
      await expect(page.getByTestId("signed-in-name").count()).resolves.toBe(0);
      await shoot(page, "bench-link-desktop");
      await page.setViewportSize(PHONE);
      await expectNoOverflow(page);
      await shoot(page, "bench-link-phone");
      await page.close();
    } finally {
      await stranger.close();
    }
  });
});
