/**
 * The whole job walked in Chromium as people do it: the demo designer signs in, starts a design from a generic
 * topology, types a value, compares two variants and two console inputs, saves a revision, makes a bench link and
 * asks the demo reviewer for a review, then signs out; the reviewer opens the mailed link from the captured mail,
 * remarks on a part and approves; the bench link opens signed out, read-only, with the revision's live figures; the
 * sign-off report downloads as a PDF with pages. A screenshot at each step (tests/output/screenshots/walk-NN-*.png).
 */
import fs from "node:fs";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../../db/demo-people";
import { lowCornerHz, readNumber, sensitivityDb } from "./bench-figures";
import { type Browser, openBrowser, screenshotPath } from "./chromium";

const baseUrl = inject("baseUrl");
const DESIGNER = "tomas@larkfield.example";
const REVIEWER = { email: "margit@larkfield.example", name: "Margit Solberg" };
const TITLE = `Walk-through cardioid ${Date.now()}`;

let step = 0;
async function shot(page: Page, name: string, fullPage = true) {
  step += 1;
  // from the top, so the sticky header is drawn where it belongs in a full-page picture
  if (fullPage) await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: screenshotPath(`walk-${String(step).padStart(2, "0")}-${name}`), fullPage });
}

async function signIn(page: Page, email: string) {
  await page.getByLabel("E-mail").first().fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

async function signOut(page: Page) {
  await page.locator("summary", { has: page.getByTestId("signed-in-name") }).click();
  await page.getByRole("button", { name: "Sign out" }).click();
  await page.waitForURL(`${baseUrl}/`);
  await page.getByRole("link", { name: "Sign in" }).first().waitFor();
}

/** A curve's figures as the curves table beside the plot shows them (sensitivity dB re 1 V/Pa, low corner Hz). */
async function curveFigures(page: Page, curveId: string) {
  const cells = await page.locator(`[data-testid="curves-table"] tr[data-curve="${curveId}"] td`).allTextContents();
  const low = cells[3] ?? "";
  const lowHz = readNumber(low) * (/kHz/.test(low) ? 1e3 : 1);
  return { sensitivityDb: readNumber(cells[1] ?? ""), lowHz };
}

const parallel = (a: number, b: number) => (a * b) / (a + b);

describe("one design walked from a first sketch to a signed-off revision", () => {
  let designerBrowser: Browser;
  let page: Page;
  let designPath = "";
  let benchLink = "";
  let reportPath = "";
  let liveSensitivityDb = Number.NaN;

  beforeAll(async () => {
    designerBrowser = await openBrowser();
    page = await designerBrowser.context.newPage();
  });

  afterAll(async () => {
    await designerBrowser.close();
  });

  it("the designer signs in and starts a design from a generic topology", async () => {
    await page.goto(baseUrl);
    await page.getByRole("heading", { level: 1 }).waitFor();
    await shot(page, "landing");
    await page.getByRole("link", { name: "Sign in" }).first().click();
    await page.waitForURL(/\/sign-in/);
    await shot(page, "sign-in");
    await signIn(page, DESIGNER);
    await page.goto(`${baseUrl}/w/larkfield`);
    await page.getByRole("button", { name: "New design" }).click();
    await page.getByLabel("Title", { exact: true }).fill(TITLE);
    await shot(page, "new-design");
    await page.getByRole("button", { name: "Create design" }).click();
    await page.waitForURL(/\/w\/larkfield\/designs\/[0-9a-f-]+$/);
    designPath = new URL(page.url()).pathname;
    await page.getByRole("heading", { level: 1, name: TITLE }).waitFor();
    await shot(page, "design-created");

    await page.getByRole("link", { name: "Open the bench" }).click();
    await page.waitForURL(/\/bench$/);
    await page.getByTestId("start-from").waitFor();
    await shot(page, "bench-start-from", false);
    await page.getByRole("button", { name: /Externally polarised capsule, JFET follower/ }).click();
    for (const id of ["MIC1", "J1", "C2", "IN1"]) await page.getByTestId(`part-${id}`).waitFor();
    await expect(page.getByTestId("start-from").count()).resolves.toBe(0);
  });

  it("types a new output capacitor and sees the low corner move to where a first-order high-pass puts it", async () => {
    await page.getByTestId("part-C2").click();
    const field = page.locator("#sheet-value-capacitance");
    await field.fill("1u");
    await field.press("Enter");
    await expect(page.getByTestId("value-C2").textContent()).resolves.toBe("1 µF");
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
    // f = 1/(2π R C) (handbook first-order high-pass): C2 = 1 µF into IN1's 2.4 kΩ, plus the follower's output
    // resistance, which is below its 2.2 kΩ source resistor — so the corner lies between these two bounds
    const upper = 1 / (2 * Math.PI * 2400 * 1e-6);
    const lower = 1 / (2 * Math.PI * (2400 + 2200) * 1e-6);
    await expect.poll(() => lowCornerHz(page), { timeout: 30_000 }).toBeGreaterThan(lower);
    expect(await lowCornerHz(page)).toBeLessThan(upper);
    liveSensitivityDb = await sensitivityDb(page);
    expect(liveSensitivityDb).not.toBeNaN();
    await shot(page, "value-typed");
  });

  it("compares two variants and two console inputs", async () => {
    await page.locator(".react-flow__pane").click({ position: { x: 40, y: 40 } });
    await page.getByTestId("design-sheet").waitFor();
    for (const [index, name, overrides] of [
      [0, "Hot bias", "VPOL=80"],
      [1, "Cool bias", "VPOL=40"],
    ] as const) {
      await page.getByRole("button", { name: "Add a variant" }).click();
      const nameField = page.getByLabel("variant name").nth(index);
      await nameField.fill(name);
      await nameField.press("Tab");
      const overridesField = page.locator('[aria-label$="parameter overrides"]').nth(index);
      await overridesField.fill(overrides);
      await overridesField.press("Tab");
    }
    await expect(page.getByLabel("variant name").count()).resolves.toBe(2);

    await page.getByRole("tab", { name: "Destinations & overlays" }).click();
    await page.getByRole("checkbox", { name: "Hot bias" }).check();
    await page.getByRole("checkbox", { name: "Cool bias" }).check();
    await page.getByRole("checkbox", { name: "Millrace transformer input" }).check();
    await page.getByRole("checkbox", { name: "Ashgrove active input" }).check();
    for (const id of ["variant:Hot bias", "variant:Cool bias", "destination:millrace-transformer", "destination:ashgrove-active"]) {
      await page.locator(`[data-testid="curves-table"] tr[data-curve="${id}"]`).waitFor({ timeout: 60_000 });
    }
    await expect.poll(async () => (await curveFigures(page, "variant:Cool bias")).sensitivityDb, { timeout: 60_000 }).not.toBeNaN();
    // an externally polarised capsule's open-circuit output is proportional to its polarising voltage (handbook):
    // 80 V against 40 V is 20·log10(2) = 6.02 dB
    const hot = await curveFigures(page, "variant:Hot bias");
    const cool = await curveFigures(page, "variant:Cool bias");
    expect(hot.sensitivityDb - cool.sensitivityDb).toBeCloseTo(20 * Math.log10(2), 1);
    // each console input sits in parallel with IN1 (2.4 kΩ): 1.2 kΩ ∥ 2.4 kΩ = 800 Ω and 2.4 kΩ ∥ 2.4 kΩ = 1.2 kΩ.
    // With a source resistance Ro, level ∝ RL/(RL+Ro) and the corner ∝ 1/(RL+Ro) (first-order divider and high-pass,
    // handbook): the heavier load is quieter by at most 800/1200 and its corner higher by at most 1200/800.
    const heavy = await curveFigures(page, "destination:millrace-transformer");
    const light = await curveFigures(page, "destination:ashgrove-active");
    const heavyLoad = parallel(1200, 2400);
    const lightLoad = parallel(2400, 2400);
    const levelRatio = 10 ** ((heavy.sensitivityDb - light.sensitivityDb) / 20);
    expect(levelRatio).toBeLessThan(1);
    expect(levelRatio).toBeGreaterThan(heavyLoad / lightLoad);
    expect(heavy.lowHz / light.lowHz).toBeGreaterThan(1);
    expect(heavy.lowHz / light.lowHz).toBeLessThan(lightLoad / heavyLoad);
    await page.getByTestId("curves-table").scrollIntoViewIfNeeded();
    await shot(page, "variants-and-destinations");
  });

  it("saves a revision with a message", async () => {
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByLabel("What changed?").fill("Polarised JFET follower, 1 µF output, hot and cool bias variants");
    await shot(page, "save-dialog", false);
    await page.getByRole("dialog").getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved as r2.").waitFor();
  });

  it("makes a public bench link and asks the reviewer for a review, then signs out", async () => {
    await page.goto(`${baseUrl}${designPath}`);
    await page.getByText("Polarised JFET follower, 1 µF output").first().waitFor();
    const linkForm = page.getByRole("form", { name: "Make a bench link" });
    await linkForm.getByLabel("Revision").selectOption({ label: "r2" });
    await linkForm.getByLabel("Label").fill("For the capsule supplier");
    await linkForm.getByLabel("Opens without signing in").check();
    await linkForm.getByRole("button", { name: "Make bench link" }).click();
    benchLink = (await page.getByTestId("new-bench-link").textContent()) ?? "";
    expect(benchLink).toMatch(new RegExp(`^${baseUrl}/b/`));
    await page.getByTestId("new-bench-link").scrollIntoViewIfNeeded();
    await shot(page, "bench-link-made");
    reportPath = (await page.getByRole("link", { name: "Sign-off report" }).first().getAttribute("href")) ?? "";
    expect(reportPath).toMatch(/\/revisions\/[0-9a-f-]+\/report$/);

    await page.getByRole("button", { name: "Request review" }).click();
    const dialog = page.getByRole("dialog", { name: "Request review" });
    await dialog.getByLabel("Revision").selectOption({ label: "r2" });
    await dialog.getByRole("checkbox", { name: new RegExp(REVIEWER.name) }).check();
    await dialog.getByLabel("Message").fill("Is 1 µF enough for the bass into a transformer input?");
    await shot(page, "review-request", false);
    await dialog.getByRole("button", { name: "Send request" }).click();
    await page.waitForURL(/\/reviews\/[0-9a-f-]+$/);
    await page.getByRole("heading", { level: 1, name: TITLE }).waitFor();
    await shot(page, "review-requested");
    await signOut(page);
    await shot(page, "designer-signed-out", false);
  });

  it("the reviewer opens the mailed link, remarks on a part and approves", async () => {
    const reviewer = await openBrowser();
    try {
      const mail = await reviewer.context.newPage();
      await mail.goto(`${baseUrl}/dev/mail`);
      const message = mail.getByTestId("captured-mail").filter({ hasText: REVIEWER.email }).filter({ hasText: TITLE }).first();
      await message.waitFor({ timeout: 15_000 });
      await shot(mail, "captured-mail", false);
      await message.getByRole("link", { name: /\/reviews\// }).click();
      await mail.waitForURL(/\/sign-in/);
      await signIn(mail, REVIEWER.email);
      await mail.waitForURL(/\/reviews\/[0-9a-f-]+$/);
      await mail.getByRole("heading", { level: 1, name: TITLE }).waitFor();

      const remark = mail.getByRole("form", { name: "New remark" });
      await remark.getByLabel("Part", { exact: true }).selectOption("C2");
      await remark.getByLabel("Remark").fill("C2 at 1 µF puts the corner near 50 Hz into 2.4 kΩ; fine for vocals.");
      await remark.getByRole("button", { name: "Add remark" }).click();
      await mail.getByText("C2 at 1 µF puts the corner near 50 Hz").first().waitFor();
      await shot(mail, "remark-added");

      await mail.getByLabel("Reason").fill("Figures hold against the targets; the remark is a note, not a blocker.");
      await mail.getByRole("button", { name: "Approve" }).click();
      await mail.getByText("Approved").first().waitFor();
      await shot(mail, "approved");

      // the sign-off report: its page, then its PDF through the page's own download link
      await mail.goto(`${baseUrl}${reportPath}`);
      await mail.getByTestId("sign-off-report").waitFor();
      await shot(mail, "report-page");
      const [download] = await Promise.all([mail.waitForEvent("download"), mail.getByRole("link", { name: "Download PDF" }).click()]);
      expect(download.suggestedFilename()).toMatch(/-sign-off\.pdf$/);
      const pdf = fs.readFileSync((await download.path()) as string);
      // ISO 32000-1 §7.5.2 and §7.7.3.3: a PDF starts with "%PDF-"; each page is a dictionary of /Type /Page
      expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
      const pages = pdf.toString("latin1").match(/\/Type\s*\/Page(?![s\w])/g) ?? [];
      expect(pages.length).toBeGreaterThanOrEqual(1);
      expect(pdf.toString("latin1").trimEnd().endsWith("%%EOF")).toBe(true);
    } finally {
      await reviewer.close();
    }
  }, 120_000);

  it("the bench link opens signed out, read-only, with the revision's live figures", async () => {
    const stranger = await openBrowser();
    try {
      const open = await stranger.context.newPage();
      await open.goto(benchLink);
      await open.getByRole("heading", { level: 1, name: TITLE }).waitFor();
      await expect(open.getByText(/read-only/i).first().isVisible()).resolves.toBe(true);
      await expect(open.getByText("Polarised JFET follower, 1 µF output").first().isVisible()).resolves.toBe(true);
      await expect(open.getByRole("button", { name: "Save revision" }).count()).resolves.toBe(0);
      await expect(open.getByRole("textbox").count()).resolves.toBe(0);
      // the server's run of the saved revision agrees with what the bench's live solve showed before saving
      const row = open.locator("dl > div", { has: open.locator("dt", { hasText: /^Sensitivity re 1 V\/Pa$/ }) });
      const shown = readNumber((await row.locator("dd").first().textContent()) ?? "");
      expect(Math.abs(shown - liveSensitivityDb)).toBeLessThanOrEqual(0.051);
      await shot(open, "bench-link-signed-out");
    } finally {
      await stranger.close();
    }
  });
});
