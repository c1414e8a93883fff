import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_WORKSPACE } from "../../db/demo-people";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { signInWithPassword } from "./http-session";

const baseUrl = inject("baseUrl");
const owner = DEMO_PEOPLE[0];

describe("password sign-in", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser.close();
  });

  it("signs in over HTTP and lists the person's workspaces", async () => {
    const { ok, session } = await signInWithPassword(baseUrl, owner.email, DEMO_PASSWORD);
    expect(ok).toBe(true);
    const response = await session.fetch("/api/workspaces");
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.workspaces.map((w: { slug: string; role: string }) => [w.slug, w.role])).toEqual([[DEMO_WORKSPACE.slug, "owner"]]);
  });

  it("refuses a wrong password and the API without a session", async () => {
    const wrong = await signInWithPassword(baseUrl, owner.email, "not-the-password", "198.51.100.7");
    expect(wrong.ok).toBe(false);
    expect(wrong.error).toBe("CredentialsSignin");
    const anonymous = await fetch(`${baseUrl}/api/workspaces`);
    expect(anonymous.status).toBe(401);
    expect((await anonymous.json()).error.message).toMatch(/Sign in/);
  });

  it("signs in through the form in Chromium, lands on the first workspace and shows the name in the header", async () => {
    const page = await browser.context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    await page.screenshot({ path: screenshotPath("sign-in-desktop"), fullPage: true });
    // Empty form: the schema's messages appear beside the fields and nothing is sent.
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.getByText("Enter your e-mail address.").waitFor();
    await page.locator("#sign-in-email").fill(owner.email);
    await page.locator("#sign-in-password").fill("wrong-password-here");
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.getByText(/do not match an account/).waitFor();
    await page.locator("#sign-in-password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL(`${baseUrl}/w/${DEMO_WORKSPACE.slug}`);
    await expect(page.getByTestId("signed-in-name").textContent()).resolves.toBe(owner.name);
    const nav = page.getByRole("navigation", { name: "Workspace" });
    await expect(nav.getByRole("link").allTextContents()).resolves.toEqual(["Designs", "Members", "Settings", "Audit"]);
    await page.close();
  });
});
