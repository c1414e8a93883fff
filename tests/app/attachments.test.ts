/**
 * Attachments in Chromium against the running app: a designer attaches a PNG (a real screenshot of the page, so an
 * encoder outside the project made it) and a minimal hand-written PDF on the design page, sees them listed with name,
 * caption, size, who and when, downloads one (its bytes and its download-only headers checked), and gets the
 * server's refusal for a program file with nothing stored; a reviewer attaches to a review on the review page, may
 * not delete the designer's file, and the designer deletes one, which leaves the bucket too.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_PASSWORD } from "../../db/demo-people";
import { testS3 } from "../integration/storage-client";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { DEMO, Pool } from "./design-fixtures";
import { type HttpSession, signInWithPassword } from "./http-session";

const baseUrl = inject("baseUrl");
const bucket = testS3(inject("s3Env"));
const pool = new Pool({ connectionString: inject("databaseUrl") });

/**
 * The smallest PDF a reader opens: catalog, page tree, one empty page (PDF 1.4, ISO 32000-1 §7.5 file structure,
 * from memory; the cross-reference table is left out, which readers rebuild).
 */
const MINIMAL_PDF = Buffer.from(
  "%PDF-1.4\n1 0 obj <</Type /Catalog /Pages 2 0 R>> endobj\n2 0 obj <</Type /Pages /Kids [3 0 R] /Count 1>> endobj\n" +
    "3 0 obj <</Type /Page /Parent 2 0 R /MediaBox [0 0 200 100]>> endobj\ntrailer <</Root 1 0 R>>\n%%EOF\n",
);
/** A Windows program's first bytes ("MZ", then zeros): neither a photo, a PDF nor text. */
const PROGRAM = Buffer.concat([Buffer.from("MZ"), Buffer.alloc(256)]);
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]; // PNG spec (ISO/IEC 15948) §5.2

let workspaceId: string;
let designId: string;
let reviewId: string;
let reviewer: HttpSession;

async function stored(filename: string) {
  const { rows } = await pool.query("SELECT id, storage_key FROM attachments WHERE design_id = $1 AND filename = $2", [designId, filename]);
  const keys = await bucket.keys(`designs/${designId}/attachments/`);
  return { rows: rows as { id: string; storage_key: string }[], objects: keys.filter((k) => k.endsWith(filename)) };
}

async function signIn(page: Page, email: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

beforeAll(async () => {
  const { rows: ws } = await pool.query("SELECT id FROM workspaces WHERE slug = 'larkfield'");
  workspaceId = ws[0].id;
  const { rows } = await pool.query(
    "SELECT d.id AS design_id, r.id AS review_id FROM designs d JOIN reviews r ON r.design_id = d.id WHERE d.title = 'LA-47 studio condenser' AND d.workspace_id = $1 ORDER BY r.created_at LIMIT 1",
    [workspaceId],
  );
  designId = rows[0].design_id;
  reviewId = rows[0].review_id;
  reviewer = (await signInWithPassword(baseUrl, DEMO.reviewer, DEMO_PASSWORD)).session;
});

afterAll(async () => {
  await pool.end();
});

describe("attachments on the design page", () => {
  let browser: Browser;
  let page: Page;
  let png: Buffer;

  beforeAll(async () => {
    browser = await openBrowser({ width: 1440, height: 1000 });
    page = await browser.context.newPage();
    await signIn(page, DEMO.designer);
  });

  afterAll(async () => {
    await browser?.close();
  });

  it("shows the limits, uploads a PNG and a PDF with captions, and lists them", async () => {
    await page.goto(`${baseUrl}/w/larkfield/designs/${designId}`);
    const panel = page.getByTestId("attachments");
    await expect(panel.textContent()).resolves.toContain("a photo (PNG, JPEG, WebP), a PDF, or a text file (.txt, .csv, .tsv), up to 20 MB");
    png = await page.screenshot({ clip: { x: 0, y: 0, width: 64, height: 48 } });
    expect([...png.subarray(0, 8)]).toEqual(PNG_SIGNATURE);

    await panel.locator('input[type="file"]').setInputFiles({ name: "bench-photo.png", mimeType: "image/png", buffer: png });
    await panel.getByLabel("Caption (optional)").fill("Prototype 3 on the bench, capsule side");
    await panel.getByRole("button", { name: "Attach", exact: true }).click();
    await panel.getByRole("status").filter({ hasText: "Attached bench-photo.png." }).waitFor();
    await panel.locator('input[type="file"]').setInputFiles({ name: "capsule-datasheet.pdf", mimeType: "application/pdf", buffer: MINIMAL_PDF });
    await panel.getByRole("button", { name: "Attach", exact: true }).click();
    await panel.getByRole("status").filter({ hasText: "Attached capsule-datasheet.pdf." }).waitFor();

    const list = panel.getByRole("list", { name: "Attachments, newest first" });
    const photo = list.getByRole("listitem").filter({ hasText: "bench-photo.png" });
    await photo.waitFor();
    const text = await photo.textContent();
    expect(text).toContain("Prototype 3 on the bench, capsule side");
    expect(text).toContain("Tomas Reyne");
    expect(text).toMatch(/\d{4}-\d\d-\d\d \d\d:\d\d UTC/);
    // sizes in SI units, computed here from the bytes sent (IEC 80000-13: 1 kB = 1000 B)
    const kb = png.byteLength / 1000;
    expect(text).toContain(png.byteLength < 1000 ? `${png.byteLength} B` : `${Number(kb.toPrecision(3))} kB`);
    await expect(list.getByRole("listitem").filter({ hasText: "capsule-datasheet.pdf" }).textContent()).resolves.toContain(`${MINIMAL_PDF.byteLength} B`);
    expect((await stored("bench-photo.png")).objects).toHaveLength(1);
    expect((await stored("capsule-datasheet.pdf")).rows).toHaveLength(1);
  });

  it("downloads the photo as a file with its bytes intact and download-only headers", async () => {
    const link = page.getByTestId("attachments").getByRole("link", { name: "bench-photo.png" });
    const [download] = await Promise.all([page.waitForEvent("download"), link.click()]);
    expect(download.suggestedFilename()).toBe("bench-photo.png");
    const saved = await download.path();
    const { readFile } = await import("node:fs/promises");
    expect(Buffer.compare(await readFile(saved), png)).toBe(0);
    const href = await link.getAttribute("href");
    const response = await page.request.get(`${baseUrl}${href}`);
    expect(response.status()).toBe(200);
    const headers = response.headers();
    expect(headers["content-type"]).toBe("image/png");
    expect(headers["content-disposition"]).toMatch(/^attachment; filename="bench-photo\.png"/);
    expect(headers["x-content-type-options"]).toBe("nosniff");
    expect(headers["content-security-policy"]).toContain("sandbox");
  });

  it("refuses a program file with the server's message and stores nothing", async () => {
    const panel = page.getByTestId("attachments");
    await panel.locator('input[type="file"]').setInputFiles({ name: "tool.exe", mimeType: "application/octet-stream", buffer: PROGRAM });
    await panel.getByRole("button", { name: "Attach", exact: true }).click();
    const alert = panel.getByRole("alert");
    await alert.waitFor();
    await expect(alert.textContent()).resolves.toBe("That file is not one Backplate keeps. Attach a photo (PNG, JPEG, WebP), a PDF, or a text file (.txt, .csv, .tsv), up to 20 MB.");
    expect(await stored("tool.exe")).toEqual({ rows: [], objects: [] });
    await expect(panel.getByRole("listitem").filter({ hasText: "tool.exe" }).count()).resolves.toBe(0);
    await panel.scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath("design-attachments"), fullPage: true });
  });

  it("lets a reviewer attach to a review, not delete the designer's file, and the designer delete one", async () => {
    const reviewerBrowser = await openBrowser({ width: 1280, height: 900 });
    try {
      const rp = await reviewerBrowser.context.newPage();
      await signIn(rp, DEMO.reviewer);
      await rp.goto(`${baseUrl}/w/larkfield/designs/${designId}/reviews/${reviewId}`);
      const panel = rp.getByTestId("attachments");
      await panel.locator('input[type="file"]').setInputFiles({ name: "margit-notes.pdf", mimeType: "application/pdf", buffer: MINIMAL_PDF });
      await panel.getByLabel("Caption (optional)").fill("Marked-up bias network");
      await panel.getByRole("button", { name: "Attach", exact: true }).click();
      const mine = panel.getByRole("listitem").filter({ hasText: "margit-notes.pdf" });
      await mine.waitFor();
      await expect(mine.textContent()).resolves.toContain("Margit Solberg");
      await expect(mine.getByRole("button", { name: "Delete margit-notes.pdf" }).count()).resolves.toBe(1);
      const { rows } = await pool.query("SELECT review_id, caption FROM attachments WHERE design_id = $1 AND filename = 'margit-notes.pdf'", [designId]);
      expect(rows).toEqual([{ review_id: reviewId, caption: "Marked-up bias network" }]);
      await rp.screenshot({ path: screenshotPath("review-attachments"), fullPage: true });
    } finally {
      await reviewerBrowser.close();
    }

    // A reviewer may delete only what they uploaded (components/schemas/attachment.ts): the server refuses the rest.
    const photo = await stored("bench-photo.png");
    const refused = await reviewer.fetch(`/api/workspaces/${workspaceId}/designs/${designId}/attachments/${photo.rows[0].id}`, { method: "DELETE" });
    expect(refused.status).toBe(403);
    expect((await refused.json()).error.message).toMatch(/only attachments you uploaded/);
    expect((await stored("bench-photo.png")).rows).toHaveLength(1);

    await page.reload();
    const panel = page.getByTestId("attachments");
    await expect(panel.getByRole("listitem").filter({ hasText: "margit-notes.pdf" }).textContent()).resolves.toContain("in a review");
    page.once("dialog", (dialog) => dialog.accept());
    await panel.getByRole("button", { name: "Delete capsule-datasheet.pdf" }).click();
    await expect.poll(() => panel.getByRole("listitem").filter({ hasText: "capsule-datasheet.pdf" }).count(), { timeout: 20_000 }).toBe(0);
    expect(await stored("capsule-datasheet.pdf")).toEqual({ rows: [], objects: [] });
  });
});
