/**
 * The "Request review" dialog on the design page, in Chromium: a designer picks two reviewers, a due day and a
 * message, sends, lands on the new review, sees it listed on the design page, and each reviewer gets a mail through
 * the SMTP fake with the review's link and the message. Sending with no reviewer picked, or with a day already gone,
 * is refused in the dialog with what to fix, and nothing is stored.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_WORKSPACE } from "../../db/demo-people";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { createDemoDesign, DEMO, Pool } from "./design-fixtures";
import { linkIn, mailTo } from "./people";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });
const TITLE = `Dialog trial ${Date.now()}`;
const MESSAGE = "Look at the bias network first, then the output coupling.";
/** A day well ahead, as an `<input type="date">` holds it: YYYY-MM-DD (HTML's valid date string, WHATWG). */
const DUE = "2099-07-15";

let browser: Browser;
let designId = "";
const people: Record<"margit" | "orla", { id: string; name: string; email: string }> = {
  margit: { id: "", name: "", email: DEMO.reviewer },
  orla: { id: "", name: "", email: DEMO.owner },
};

const reviewCount = async () => (await pool.query("SELECT count(*)::int AS n FROM reviews WHERE design_id = $1", [designId])).rows[0].n as number;

beforeAll(async () => {
  ({ designId } = await createDemoDesign(baseUrl, pool, TITLE));
  const { rows } = await pool.query("SELECT id, name, email FROM users WHERE email = ANY($1)", [[people.margit.email, people.orla.email]]);
  for (const row of rows) Object.assign(row.email === people.margit.email ? people.margit : people.orla, { id: row.id, name: row.name });
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
  await pool.end();
});

describe("the request-review dialog", () => {
  it("sends a request with two reviewers, a due day and a message; the review shows it and the reviewers get mail", async () => {
    const page = await browser.context.newPage();
    const designPath = `/w/${DEMO_WORKSPACE.slug}/designs/${designId}`;
    await page.goto(`${baseUrl}/sign-in?callbackUrl=${encodeURIComponent(designPath)}`);
    await page.getByLabel("E-mail").first().fill(DEMO.designer);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL(`${baseUrl}${designPath}`);
    await page.getByRole("heading", { level: 1, name: TITLE }).waitFor();

    await page.getByRole("button", { name: "Request review" }).click();
    const dialog = page.getByRole("dialog", { name: "Request review" });
    await dialog.waitFor();
    // the person asking is not offered as their own reviewer
    await expect(dialog.getByRole("checkbox", { name: /Tomas/ }).count()).resolves.toBe(0);

    // nothing picked: refused in the dialog with what to do, nothing stored
    await dialog.getByLabel("Message").fill(MESSAGE);
    await dialog.getByRole("button", { name: "Send request" }).click();
    await expect(dialog.getByRole("alert").textContent()).resolves.toBe("Pick at least one reviewer.");
    expect(await reviewCount()).toBe(0);

    await dialog.getByRole("checkbox", { name: new RegExp(people.margit.name) }).check();
    await dialog.getByRole("checkbox", { name: new RegExp(people.orla.name) }).check();
    // the refusal went away once a reviewer was picked, so it does not sit beside a form that is now fine
    await expect(dialog.getByRole("alert").count()).resolves.toBe(0);
    // a day already gone: the server's refusal is shown as sent, and again nothing is stored
    await dialog.getByLabel("Due by (optional)").fill("2001-01-01");
    await dialog.getByRole("button", { name: "Send request" }).click();
    await expect.poll(() => dialog.getByRole("alert").textContent()).toBe("The due date is in the past. Choose a day from today on.");
    expect(await reviewCount()).toBe(0);
    await dialog.getByLabel("Due by (optional)").fill(DUE);
    await expect(dialog.getByRole("alert").count()).resolves.toBe(0);
    await page.screenshot({ path: screenshotPath("request-review-dialog") });
    await dialog.getByRole("button", { name: "Send request" }).click();

    await page.waitForURL(new RegExp(`${designPath}/reviews/[0-9a-f-]{36}$`));
    const reviewUrl = page.url();
    const reviewId = reviewUrl.split("/reviews/")[1];
    await page.getByRole("heading", { level: 1, name: TITLE }).waitFor();
    await expect(page.getByText(`due ${DUE}`).count()).resolves.toBe(1);
    await expect(page.getByText(MESSAGE).count()).resolves.toBeGreaterThan(0);

    // stored once, with both reviewers and the day asked for (end of that day, UTC)
    const { rows } = await pool.query(
      "SELECT r.message, r.due_at, array_agg(rr.user_id::text ORDER BY rr.user_id) AS reviewers FROM reviews r JOIN review_reviewers rr ON rr.review_id = r.id WHERE r.id = $1 GROUP BY r.id",
      [reviewId],
    );
    expect(rows).toHaveLength(1);
    expect(rows[0].message).toBe(MESSAGE);
    expect((rows[0].due_at as Date).toISOString().slice(0, 10)).toBe(DUE);
    expect(rows[0].reviewers).toEqual([people.margit.id, people.orla.id].sort());

    // listed on the design page with who was asked
    await page.goto(`${baseUrl}${designPath}`);
    const listed = page.getByRole("region", { name: "Reviews" });
    await expect.poll(() => listed.textContent()).toMatch(/r1 · Open/);
    await expect(listed.textContent()).resolves.toContain(people.margit.name);
    await expect(listed.textContent()).resolves.toContain(people.orla.name);

    // each reviewer's mail, captured by the SMTP fake, links to this review and carries the message and the day
    for (const person of [people.margit, people.orla]) {
      const mail = await mailTo(baseUrl, person.email, new RegExp(`asks you to review ${TITLE} r1`), 15_000);
      expect(linkIn(mail.text, "/reviews/")).toBe(reviewUrl);
      expect(mail.text).toContain(MESSAGE);
      expect(mail.text).toContain(DUE);
    }
    await page.close();
  }, 120_000);
});
