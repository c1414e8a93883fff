import { randomUUID } from "node:crypto";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { linkIn, mailTo, signUp } from "./people";

const baseUrl = inject("baseUrl");

async function signOut(page: Page) {
  await page.locator("summary", { hasText: "account menu" }).click();
  await page.getByRole("button", { name: "Sign out" }).click();
  await page.waitForURL(`${baseUrl}/`);
  await page.getByRole("link", { name: "Sign in" }).waitFor();
}

async function noSideways(page: Page) {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

describe("accounts in Chromium: sign-up, password, mail link, members", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser.close();
  });

  it("signs up, signs in with a password and with a mailed link, invites someone and changes their role", async () => {
    const page = await browser.context.newPage();
    const email = `founder-${randomUUID().slice(0, 8)}@people.example`;
    const password = "a-founding-password";

    // Sign up: the form checks first, then the account is made and signed in.
    await page.goto(`${baseUrl}/sign-up`);
    await page.locator("#sign-up-name").fill("Ada Quillfeather");
    await page.locator("#sign-up-email").fill(email);
    await page.locator("#sign-up-password").fill("short");
    await page.getByRole("button", { name: "Create account" }).click();
    await page.getByText("Use at least 10 characters.").waitFor();
    await page.locator("#sign-up-password").fill(password);
    await page.getByRole("button", { name: "Create account" }).click();
    await page.waitForURL(`${baseUrl}/workspaces`);
    await page.getByText("You are not in a workspace yet.").waitFor();
    await page.locator("#workspace-name").fill("Quillfeather Audio");
    await page.getByRole("button", { name: "Create workspace" }).click();
    await page.waitForURL(/\/w\/quillfeather-audio/);
    const slug = new URL(page.url()).pathname.split("/")[2];
    await signOut(page);

    // Password sign-in lands on the first workspace's designs page.
    await page.goto(`${baseUrl}/sign-in`);
    await page.locator("#sign-in-email").fill(email);
    await page.locator("#sign-in-password").fill(password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL(`${baseUrl}/w/${slug}`);
    await expect(page.getByTestId("signed-in-name").textContent()).resolves.toBe("Ada Quillfeather");
    await signOut(page);

    // Mail-link sign-in: ask for the link, read it on the captured-mail page, follow it.
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole("button", { name: "Use a sign-in link instead" }).click();
    await page.locator("#email-link-email").fill(email);
    await page.getByRole("button", { name: "E-mail me a sign-in link" }).click();
    await page.getByText(/A sign-in link is on its way/).waitFor();
    await page.goto(`${baseUrl}/dev/mail`);
    const card = page.getByTestId("captured-mail").filter({ hasText: email }).first();
    await card.getByText("Your Backplate sign-in link").waitFor();
    await card.locator('a[href*="/api/auth/callback/email"]').click();
    await page.waitForURL(`${baseUrl}/w/${slug}`);
    await expect(page.getByTestId("signed-in-name").textContent()).resolves.toBe("Ada Quillfeather");

    // The owner invites a colleague from the members page; the colleague accepts the mailed link.
    const colleague = await signUp(baseUrl, "colleague");
    await page.goto(`${baseUrl}/w/${slug}/members`);
    await page.getByTestId("member-row").first().waitFor();
    await page.getByText("No open invitations.").waitFor();
    await page.locator("#invite-email").fill(colleague.email);
    await page.locator("#invite-role").selectOption("viewer");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${colleague.email}`).waitFor();
    await page.getByTestId("invitation-row").filter({ hasText: colleague.email }).waitFor();
    const mail = await mailTo(baseUrl, colleague.email, /invites you to Quillfeather Audio/);
    const token = linkIn(mail.text, "/invitations/").split("/invitations/")[1];
    expect((await colleague.session.fetch(`/api/invitations/${token}`, { method: "POST" })).status).toBe(200);

    // The owner makes the colleague a designer; the list and the server agree.
    await page.reload();
    const row = page.getByTestId("member-row").filter({ hasText: colleague.email });
    await row.locator("select").selectOption("designer");
    await expect
      .poll(async () => {
        const { workspaces } = await (await colleague.session.fetch("/api/workspaces")).json();
        return workspaces.find((w: { slug: string }) => w.slug === slug)?.role;
      })
      .toBe("designer");
    await page.reload();
    await expect(page.getByTestId("member-row").filter({ hasText: colleague.email }).locator("select").inputValue()).resolves.toBe(
      "designer",
    );

    // The last owner is told why they cannot step down, and stays owner.
    await page.getByTestId("member-row").filter({ hasText: email }).locator("select").selectOption("viewer");
    await page.getByText(/at least one owner/).waitFor();
    await page.screenshot({ path: screenshotPath("members-desktop"), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.reload();
    await page.getByTestId("member-row").first().waitFor();
    expect(await noSideways(page)).toBeLessThanOrEqual(0);
    await page.screenshot({ path: screenshotPath("members-phone"), fullPage: true });

    // The audit page lists what happened.
    await page.setViewportSize({ width: 1440, height: 900 });
    await page.goto(`${baseUrl}/w/${slug}/audit`);
    await page.getByTestId("audit-row").first().waitFor();
    const actions = await page.getByTestId("audit-row").locator("td:nth-child(3)").allTextContents();
    expect(actions.slice(0, 4)).toEqual(["member.role", "invitation.accept", "invitation.create", "workspace.create"]);
    await page.close();
  });

  it("shows the sign-in page on a phone without sideways scrolling", async () => {
    // Signed out: the first test left this browser signed in, and /sign-in sends signed-in people on.
    await browser.context.clearCookies();
    const page = await browser.context.newPage();
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole("heading", { name: "Sign in to the bench" }).waitFor();
    expect(await noSideways(page)).toBeLessThanOrEqual(0);
    await page.screenshot({ path: screenshotPath("sign-in-phone"), fullPage: true });
    await page.close();
  });
});
