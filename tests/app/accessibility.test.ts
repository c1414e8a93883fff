/**
 * Accessibility of every page a person meets, checked by axe-core (the open-source WCAG 2.x rules engine, injected
 * into each page in Chromium): no finding of "serious" or "critical" impact. Signed-out pages first, then the demo
 * owner's pages on a demo design that has a review.
 */
import { createRequire } from "node:module";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_WORKSPACE } from "../../db/demo-people";
import { type Browser, openBrowser, screenshotPath } from "./chromium";
import { DEMO, Pool, workspaceIdOf } from "./design-fixtures";
import { signInWithPassword } from "./http-session";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });
const AXE_SCRIPT = createRequire(import.meta.url).resolve("axe-core/axe.min.js");
/**
 * WCAG 2.1 levels A and AA, the level products are usually held to (common practice), and axe-core's best practices.
 * WCAG 2.2's target size (2.5.8) is not held here yet: the bench's compact rows are below 24 px.
 */
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"];
const BLOCKING = new Set(["serious", "critical"]);

interface Finding {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[]; failureSummary?: string }[];
}

/** axe-core's findings on the page as it stands, serious and critical only, as readable lines. */
async function blockingFindings(page: Page): Promise<string[]> {
  await page.addScriptTag({ path: AXE_SCRIPT });
  const violations = (await page.evaluate(async (tags) => {
    const axe = (window as unknown as { axe: { run: (ctx: unknown, opts: unknown) => Promise<{ violations: unknown[] }> } }).axe;
    return (await axe.run(document, { runOnly: { type: "tag", values: tags }, resultTypes: ["violations"] })).violations;
  }, WCAG_TAGS)) as Finding[];
  return violations
    .filter((v) => v.impact && BLOCKING.has(v.impact))
    .flatMap((v) => v.nodes.slice(0, 5).map((n) => `${v.impact} ${v.id} (${v.help}) at ${n.target.join(" ")}: ${n.failureSummary ?? ""}`));
}

interface PageToCheck {
  name: string;
  path: () => string;
  /** what shows once the page has its content */
  ready: (page: Page) => Promise<unknown>;
  /** a state of the page reached by a person's action (a tab, a selected part, an open dialog) */
  act?: (page: Page) => Promise<unknown>;
}

const heading = (page: Page) => page.getByRole("heading", { level: 1 }).first().waitFor();
const benchReady = (page: Page) => page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 30_000 });
const benchPath = () => `/w/${DEMO_WORKSPACE.slug}/designs/${ids.designId}/bench`;
const resultsTab = (name: string) => async (page: Page) => {
  await page.getByRole("tab", { name }).click();
  await page.getByRole("tab", { name, selected: true }).waitFor();
};

const ids = { designId: "", revisionId: "", reviewId: "", benchLink: "" };

const SIGNED_OUT: PageToCheck[] = [
  { name: "landing", path: () => "/", ready: heading },
  { name: "sign-in", path: () => "/sign-in", ready: heading },
  { name: "sign-up", path: () => "/sign-up", ready: heading },
  { name: "bench-link", path: () => ids.benchLink, ready: heading },
];

const SIGNED_IN: PageToCheck[] = [
  { name: "workspaces", path: () => "/workspaces", ready: heading },
  { name: "designs-table", path: () => `/w/${DEMO_WORKSPACE.slug}`, ready: (page) => page.getByRole("table").first().waitFor() },
  { name: "design", path: () => `/w/${DEMO_WORKSPACE.slug}/designs/${ids.designId}`, ready: heading },
  {
    name: "design-request-review",
    path: () => `/w/${DEMO_WORKSPACE.slug}/designs/${ids.designId}`,
    ready: heading,
    act: async (page) => {
      await page.getByRole("button", { name: "Request review" }).click();
      await page.getByRole("dialog", { name: "Request review" }).waitFor();
    },
  },
  { name: "bench", path: benchPath, ready: benchReady },
  {
    name: "bench-part-sheet",
    path: benchPath,
    ready: benchReady,
    act: async (page) => {
      // A part the pointer can reach: fitting keeps labels readable, so a large drawing may run past the canvas edge.
      const reachable = await page.evaluate(() => {
        for (const node of document.querySelectorAll<HTMLElement>('.react-flow__node [data-testid^="part-"]')) {
          const box = node.getBoundingClientRect();
          const hit = document.elementFromPoint(box.x + box.width / 2, box.y + box.height / 2);
          if (hit && node.contains(hit)) return node.dataset.testid ?? null;
        }
        return null;
      });
      expect(reachable, "no part of the bench drawing is visible to click").not.toBeNull();
      await page.getByTestId(reachable!).click();
      await page.getByTestId("part-sheet").waitFor();
    },
  },
  { name: "bench-destinations-overlays", path: benchPath, ready: benchReady, act: resultsTab("Destinations & overlays") },
  { name: "bench-measurements", path: benchPath, ready: benchReady, act: resultsTab("Measurements") },
  { name: "bench-explain", path: benchPath, ready: benchReady, act: resultsTab("Explain") },
  { name: "bench-calculators", path: benchPath, ready: benchReady, act: resultsTab("Calculators") },
  { name: "review", path: () => `/w/${DEMO_WORKSPACE.slug}/designs/${ids.designId}/reviews/${ids.reviewId}`, ready: heading },
  {
    name: "report",
    path: () => `/w/${DEMO_WORKSPACE.slug}/designs/${ids.designId}/revisions/${ids.revisionId}/report`,
    ready: (page) => page.getByTestId("sign-off-report").waitFor(),
  },
  { name: "members", path: () => `/w/${DEMO_WORKSPACE.slug}/members`, ready: heading },
  { name: "settings", path: () => `/w/${DEMO_WORKSPACE.slug}/settings`, ready: heading },
  { name: "account", path: () => "/account", ready: heading },
  { name: "inbox", path: () => "/inbox", ready: heading },
];

let browser: Browser;
let page: Page;

beforeAll(async () => {
  const workspaceId = await workspaceIdOf(pool, DEMO_WORKSPACE.slug);
  const { rows } = await pool.query(
    `SELECT r.id AS review_id, r.design_id, r.revision_id FROM reviews r JOIN designs d ON d.id = r.design_id
     WHERE d.workspace_id = $1 AND d.deleted_at IS NULL ORDER BY r.created_at LIMIT 1`,
    [workspaceId],
  );
  expect(rows, "the demo seed has a review").toHaveLength(1);
  Object.assign(ids, { designId: rows[0].design_id, revisionId: rows[0].revision_id, reviewId: rows[0].review_id });
  const owner = await signInWithPassword(baseUrl, DEMO.owner, DEMO_PASSWORD);
  const made = await owner.session.fetch(`/api/workspaces/${workspaceId}/designs/${ids.designId}/bench-links`, {
    method: "POST",
    body: { revisionId: null, label: "Accessibility check", isPublic: true, expiresAt: null, view: { plot: "response" } },
  });
  expect(made.status, await made.clone().text()).toBe(201);
  ids.benchLink = (await made.json()).path;
  browser = await openBrowser();
  page = await browser.context.newPage();
});

afterAll(async () => {
  await browser?.close();
  await pool.end();
});

async function check(entry: PageToCheck) {
  await page.goto(`${baseUrl}${entry.path()}`);
  await entry.ready(page);
  await entry.act?.(page);
  const findings = await blockingFindings(page);
  if (findings.length > 0) await page.screenshot({ path: screenshotPath(`a11y-${entry.name}`), fullPage: true });
  expect(findings, `${entry.name} (${entry.path()})`).toEqual([]);
}

describe("signed out", () => {
  for (const entry of SIGNED_OUT) it(`${entry.name} has no serious or critical axe-core finding`, () => check(entry));
});

describe("signed in as the demo owner", () => {
  beforeAll(async () => {
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel("E-mail").first().fill(DEMO.owner);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  });
  for (const entry of SIGNED_IN) it(`${entry.name} has no serious or critical axe-core finding`, () => check(entry));
});
