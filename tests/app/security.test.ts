/**
 * The app's defences over HTTP and in Chromium: cross-site state changes refused (OWASP CSRF cheat sheet, "verifying
 * origin with standard headers"; Fetch Metadata, W3C), the page Content-Security-Policy with a per-request nonce
 * (CSP Level 3, W3C) under which the bench's plots and solver still work, the common response headers (nosniff —
 * WHATWG Fetch; Referrer-Policy, Permissions-Policy — W3C), the session cookie's attributes (RFC 6265bis), limits on
 * sign-up and password reset, and uploads served only as downloads.
 */
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_WORKSPACE } from "../../db/demo-people";
import { SIGN_UPS_PER_ADDRESS, RESET_REQUESTS_PER_EMAIL } from "../../app/_server/account-limits";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { DEMO, Pool, signInAll, workspaceIdOf } from "./design-fixtures";
import { type HttpSession, originHeader } from "./http-session";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });
afterAll(() => pool.end());

let as: Awaited<ReturnType<typeof signInAll>>;
let ws: string;
beforeAll(async () => {
  as = await signInAll(baseUrl);
  ws = await workspaceIdOf(pool, DEMO_WORKSPACE.slug);
}, 120_000);

/** A POST as a signed-in person with exactly these extra headers (no Origin unless given). */
function postAs(session: HttpSession, path: string, headers: Record<string, string>, body = "{not json") {
  return fetch(`${baseUrl}${path}`, { method: "POST", headers: { cookie: session.cookie, "content-type": "application/json", ...headers }, body });
}

describe("cross-site request forgery", () => {
  it("refuses a state change from another origin or with no origin, with a message that says what to send", async () => {
    const evil = await postAs(as.owner, `/api/workspaces/${ws}/designs`, { origin: "https://evil.example" }, JSON.stringify({ title: "Forged" }));
    expect(evil.status).toBe(403);
    expect((await evil.json()).error.message).toMatch(/another site \(https:\/\/evil\.example\)/);
    const bare = await postAs(as.owner, `/api/workspaces/${ws}/designs`, {}, JSON.stringify({ title: "Forged" }));
    expect(bare.status).toBe(403);
    expect((await bare.json()).error.message).toMatch(/no Origin header\. Send Origin set to/);
    const crossSite = await postAs(as.owner, `/api/workspaces/${ws}/designs`, { "sec-fetch-site": "cross-site" }, JSON.stringify({ title: "Forged" }));
    expect(crossSite.status).toBe(403);
    for (const method of ["PUT", "PATCH", "DELETE"]) {
      const response = await fetch(`${baseUrl}/api/notifications/preferences`, { method, headers: { cookie: as.viewer.cookie, origin: "http://localhost.evil" } });
      expect(response.status, method).toBe(403);
    }
    const { rows } = await pool.query("SELECT count(*)::int AS n FROM designs WHERE title = 'Forged'");
    expect(rows[0].n).toBe(0);
  });

  it("lets the app's own origin and Sec-Fetch-Site: same-origin through, and reads need neither", async () => {
    expect((await postAs(as.viewer, "/api/notifications", originHeader(baseUrl))).status).toBe(400); // reached the JSON check
    expect((await postAs(as.viewer, "/api/notifications", { "sec-fetch-site": "same-origin" })).status).toBe(400);
    expect((await fetch(`${baseUrl}/api/workspaces`, { headers: { cookie: as.viewer.cookie } })).status).toBe(200);
  });
});

describe("response headers", () => {
  const COMMON = {
    "x-content-type-options": "nosniff",
    "referrer-policy": "strict-origin-when-cross-origin",
    "x-frame-options": "DENY",
  };

  it("gives each page a policy with a fresh nonce that Next puts on its scripts", async () => {
    const first = await fetch(`${baseUrl}/`);
    const second = await fetch(`${baseUrl}/`);
    const policy = first.headers.get("content-security-policy") ?? "";
    const directives = new Map(policy.split(";").map((d) => { const [name, ...values] = d.trim().split(/\s+/); return [name, values]; }));
    const nonce = /'nonce-([A-Za-z0-9+/=]+)'/.exec(policy)?.[1];
    expect(nonce, policy).toBeTruthy();
    expect(Buffer.from(nonce ?? "", "base64").length).toBeGreaterThanOrEqual(16); // CSP3: at least 128 bits
    expect(second.headers.get("content-security-policy")).not.toContain(nonce);
    // no 'unsafe-eval' and no 'unsafe-inline' for scripts: the bench test below proves Plotly and React Flow need neither
    expect(directives.get("script-src")).toEqual(["'self'", `'nonce-${nonce}'`, "'strict-dynamic'"]);
    expect(directives.get("frame-ancestors")).toEqual(["'none'"]);
    expect(directives.get("object-src")).toEqual(["'none'"]);
    expect(directives.get("base-uri")).toEqual(["'self'"]);
    expect(directives.get("connect-src")).toEqual(["'self'"]);
    expect(directives.get("worker-src")).toEqual(["'self'", "blob:"]);
    expect(directives.get("img-src")).toEqual(["'self'", "data:", "blob:"]);
    const html = await first.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    expect(scripts.filter((tag) => !tag.includes(`nonce="${nonce}"`))).toEqual([]);
  });

  it("sends nosniff, Referrer-Policy, Permissions-Policy and no framing on pages, API answers and static files", async () => {
    const page = await fetch(`${baseUrl}/`);
    const chunk = /\/_next\/static\/[^"']+\.js/.exec(await page.text())?.[0];
    expect(chunk).toBeTruthy();
    for (const path of ["/", "/sign-in", "/api/health", `/api/workspaces/${ws}/designs`, chunk as string]) {
      const response = await fetch(`${baseUrl}${path}`);
      for (const [name, value] of Object.entries(COMMON)) expect(response.headers.get(name), `${name} on ${path}`).toBe(value);
      expect(response.headers.get("permissions-policy"), path).toMatch(/camera=\(\), microphone=\(\), geolocation=\(\)/);
    }
  });
});

describe("the session cookie", () => {
  it("is HttpOnly and SameSite=Lax, and not Secure while the app is served over plain http", async () => {
    const csrf = await fetch(`${baseUrl}/api/auth/csrf`);
    const cookie = csrf.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const { csrfToken } = await csrf.json();
    const response = await fetch(`${baseUrl}/api/auth/callback/password`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded", cookie },
      body: new URLSearchParams({ csrfToken, email: DEMO.viewer, password: DEMO_PASSWORD, json: "true" }),
      redirect: "manual",
    });
    const session = response.headers.getSetCookie().find((line) => /^(__Secure-)?next-auth\.session-token=/.test(line));
    expect(session).toBeTruthy();
    const attributes = (session ?? "").split(";").map((a) => a.trim().toLowerCase());
    expect(attributes).toContain("httponly");
    expect(attributes).toContain("samesite=lax");
    expect(attributes).toContain("path=/");
    // Secure only behind HTTPS (the next case); this run is plain http, where a browser would drop a Secure cookie.
    expect(attributes).not.toContain("secure");
  });

  it("is Secure (named __Secure-…) when a TLS-ending proxy says X-Forwarded-Proto: https, and that session works", async () => {
    const behindTls = { "x-forwarded-proto": "https" };
    const csrf = await fetch(`${baseUrl}/api/auth/csrf`, { headers: behindTls });
    // next-auth's CSRF cookie takes the __Host- prefix when secure (RFC 6265bis: Secure, Path=/, no Domain)
    const csrfLine = csrf.headers.getSetCookie().find((line) => line.startsWith("__Host-next-auth.csrf-token="));
    expect(csrfLine, csrf.headers.getSetCookie().join("\n")).toBeTruthy();
    const cookie = csrf.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const { csrfToken } = await csrf.json();
    const response = await fetch(`${baseUrl}/api/auth/callback/password`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded", cookie, ...behindTls },
      body: new URLSearchParams({ csrfToken, email: DEMO.viewer, password: DEMO_PASSWORD, json: "true" }),
      redirect: "manual",
    });
    const session = response.headers.getSetCookie().find((line) => line.startsWith("__Secure-next-auth.session-token="));
    expect(session, response.headers.getSetCookie().join("\n")).toBeTruthy();
    const attributes = (session ?? "").split(";").map((a) => a.trim().toLowerCase());
    expect(attributes).toEqual(expect.arrayContaining(["httponly", "samesite=lax", "secure", "path=/"]));
    // the server reads the session back under the same name when the request comes the same way
    const pair = (session ?? "").split(";")[0];
    const account = await fetch(`${baseUrl}/api/account`, { headers: { cookie: pair, ...behindTls } });
    expect(account.status).toBe(200);
    expect((await account.json()).user.email).toBe(DEMO.viewer);
  });
});

describe("limits on the forms a stranger can reach", () => {
  it("stops sign-ups from one address after the hourly allowance", async () => {
    const address = `198.51.100.${Math.floor(Math.random() * 200) + 1}`; // RFC 5737 documentation range
    const statuses: number[] = [];
    for (let i = 0; i <= SIGN_UPS_PER_ADDRESS.max; i++) {
      const response = await fetch(`${baseUrl}/api/account/sign-up`, { method: "POST", headers: { "content-type": "application/json", "x-forwarded-for": address, ...originHeader(baseUrl) }, body: "{not json" });
      statuses.push(response.status);
      if (i === SIGN_UPS_PER_ADDRESS.max) expect((await response.json()).error.message).toMatch(/Wait an hour/);
    }
    expect(statuses.slice(0, -1).every((s) => s === 400)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
  });

  it("stops reset links to one address after five an hour, and says when to ask again", async () => {
    const email = `flooded-${Date.now()}@people.example`;
    const statuses: number[] = [];
    for (let i = 0; i <= RESET_REQUESTS_PER_EMAIL.max; i++) {
      const address = `203.0.113.${i + 1}`; // a different address each time: the per-e-mail window must hold alone
      const response = await fetch(`${baseUrl}/api/account/password-reset`, { method: "POST", headers: { "content-type": "application/json", "x-forwarded-for": address, ...originHeader(baseUrl) }, body: JSON.stringify({ email }) });
      statuses.push(response.status);
    }
    expect(statuses).toEqual([...Array(RESET_REQUESTS_PER_EMAIL.max).fill(202), 429]);
  });
});

describe("uploads", () => {
  it("serves an uploaded text file holding HTML as a plain-text download, never inline", async () => {
    const { rows } = await pool.query("SELECT id FROM designs WHERE workspace_id = $1 AND deleted_at IS NULL LIMIT 1", [ws]);
    const designId = rows[0].id;
    const form = new FormData();
    form.set("file", new Blob(["<html><script>alert(document.cookie)</script></html>"]), "notes.txt");
    const uploaded = await fetch(`${baseUrl}/api/workspaces/${ws}/designs/${designId}/attachments`, { method: "POST", body: form, headers: { cookie: as.reviewer.cookie, ...originHeader(baseUrl) } });
    expect(uploaded.status, await uploaded.clone().text()).toBe(201);
    const { attachment } = await uploaded.json();
    const download = await as.viewer.fetch(`/api/workspaces/${ws}/designs/${designId}/attachments/${attachment.id}`);
    expect(download.status).toBe(200);
    expect(download.headers.get("content-type")).toBe("text/plain; charset=utf-8");
    expect(download.headers.get("content-disposition")).toMatch(/^attachment; filename="notes\.txt"/);
    expect(download.headers.get("x-content-type-options")).toBe("nosniff");
    expect(download.headers.get("content-security-policy")).toBe("default-src 'none'; sandbox");
  });
});

describe("the bench under the policy, in Chromium", () => {
  let browser: Browser;
  let page: Page;
  beforeAll(async () => {
    browser = await openBrowser({ width: 1440, height: 900 });
  });
  afterAll(() => browser.close());

  it("draws the plots and solves with no policy violation reported and no console error", async () => {
    page = await browser.context.newPage();
    const reported: string[] = [];
    // Every console error counts, not only the policy's own reports: a script refused by the policy can surface as
    // a failed chunk load or an uncaught EvalError instead.
    page.on("console", (message) => {
      if (message.type() === "error" || /Content Security Policy|Refused to/i.test(message.text())) reported.push(`console ${message.type()}: ${message.text()} (${message.location().url})`);
    });
    page.on("pageerror", (error) => reported.push(`uncaught: ${error.message}`));
    page.on("response", (response) => {
      if (response.status() >= 400) reported.push(`${response.status()} ${response.url()}`);
    });
    await page.addInitScript(() => {
      const w = window as unknown as { __violations: string[] };
      w.__violations = [];
      document.addEventListener("securitypolicyviolation", (e) =>
        w.__violations.push(`${e.violatedDirective} ${e.blockedURI} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber} ${e.sample}`),
      );
    });
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel("E-mail").fill(DEMO.designer);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    const { rows } = await pool.query("SELECT id FROM designs WHERE workspace_id = $1 AND title = 'LA-47 studio condenser'", [ws]);
    const response = await page.goto(`${baseUrl}/w/larkfield/designs/${rows[0].id}/bench`);
    // the policy under test is the one shipped: no 'unsafe-eval' (app/_server/security-headers.ts)
    expect(response?.headers()["content-security-policy"]).not.toContain("unsafe-eval");
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 60_000 });
    await page.locator('[data-testid="plot-bode"] .js-plotly-plot').waitFor();
    const traces = await page.evaluate(() => (document.querySelector('[data-testid="plot-bode"] .js-plotly-plot') as HTMLElement & { data?: unknown[] }).data?.length ?? 0);
    expect(traces).toBeGreaterThan(0);
    await page.locator(".react-flow__node").first().waitFor();
    await page.screenshot({ path: screenshotPath("security-bench-under-csp"), fullPage: false });
    // The curves are drawn (SVG paths in Plotly's trace layer), and hovering runs Plotly's hover code too.
    const plot = page.locator('[data-testid="plot-bode"] .js-plotly-plot');
    await plot.scrollIntoViewIfNeeded();
    expect(await plot.locator(".scatterlayer path.js-line").count()).toBeGreaterThan(0);
    const box = await plot.boundingBox();
    if (box) await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await plot.screenshot({ path: screenshotPath("security-bench-plot-under-csp") });
    const violations = await page.evaluate(() => (window as unknown as { __violations: string[] }).__violations);
    expect([...violations, ...reported]).toEqual([]);
  });
});
