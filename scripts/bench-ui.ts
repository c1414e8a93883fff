/**
 * `npm run bench:ui`: the bench's "value change → updated plots" time in Chromium, measured with the page's own
 * performance marks (components/bench/solver/update-timing.ts). Starts the built app with its own services and the
 * demo seed (scripts/lib/built-app.ts, building into .next-test when the sources changed), opens the demo design's
 * bench as its designer, changes one parameter 20 times and prints the median and p90 of the durations with the
 * median of each stage (edit → sent, solve, render, plot). Target: median under 50 ms.
 *   --json              machine-readable output
 *   --profile <file>    also write a Chromium CPU profile (.cpuprofile, opens in the browser's dev tools)
 *   --trace <file>      also write a Chromium performance trace of the measured changes (JSON; it shows style,
 *                       layout and paint, which a CPU profile lumps together as "(program)")
 */
import fs from "node:fs";
import { chromium } from "playwright-core";
import type { UpdateStages } from "../components/bench/solver/update-timing";
import { startBuiltApp } from "./lib/built-app";

const TARGET_MS = 50;
const CHANGES = 20;
const WARM_UP_CHANGES = 3;
const DESIGNER = { email: "tomas@larkfield.example", password: "bench-demo-2026" };
const DESIGN_TITLE = "LA-47 studio condenser";
const PARAMETER = "RS";
// each value differs from the one before it, so every change re-solves
const VALUES = ["3k3", "3k6", "4k7", "5k6", "6k8"];
const CHROMIUM_FLAGS = ["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"];

// the page's timing globals (window.__benchUpdateDurations, __benchUpdateStages) are declared there
type Stages = UpdateStages;

const args = process.argv.slice(2);
const json = args.includes("--json");
const profileAt = args.indexOf("--profile");
const profileFile = profileAt >= 0 ? args[profileAt + 1] : null;
const traceAt = args.indexOf("--trace");
const traceFile = traceAt >= 0 ? args[traceAt + 1] : null;
const log = (line: string) => {
  if (!json) console.error(line);
};

/** the q-quantile of `values` by linear interpolation between order statistics */
function quantile(values: number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  const at = (sorted.length - 1) * q;
  const low = Math.floor(at);
  const high = Math.ceil(at);
  return sorted[low] + (sorted[high] - sorted[low]) * (at - low);
}

async function main() {
  const app = await startBuiltApp(process.env.BACKPLATE_TEST_DIST_DIR || ".next-test", log);
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_FLAGS });
  try {
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
    await page.goto(`${app.baseUrl}/sign-in`);
    await page.getByLabel("E-mail").fill(DESIGNER.email);
    await page.getByLabel("Password").fill(DESIGNER.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    const api = page.context().request;
    const { workspaces } = await (await api.get(`${app.baseUrl}/api/workspaces`)).json();
    const workspace = workspaces.find((w: { slug: string }) => w.slug === "larkfield");
    const list = await (await api.get(`${app.baseUrl}/api/workspaces/${workspace.workspaceId}/designs?q=LA-47`)).json();
    const design = list.rows.find((d: { title: string }) => d.title === DESIGN_TITLE);
    await page.goto(`${app.baseUrl}/w/larkfield/designs/${design.id}/bench`);
    await page.locator('[data-testid="bench-results"][data-status="ready"]').waitFor({ timeout: 60_000 });
    await page.locator('[data-testid="plot-bode"] .js-plotly-plot').waitFor({ timeout: 60_000 });

    const input = page.getByLabel(`parameter ${PARAMETER}`, { exact: true });
    const change = async (i: number) => {
      const before = await page.evaluate(() => window.__benchUpdateDurations?.length ?? 0);
      await input.fill(VALUES[i % VALUES.length]);
      await input.press("Enter");
      await page.waitForFunction((n) => (window.__benchUpdateDurations?.length ?? 0) > n, before, { timeout: 20_000 });
      // let the page go idle (the impedance sweep that follows, React's passive effects) before the next change
      await page.waitForTimeout(150);
    };
    for (let i = 0; i < WARM_UP_CHANGES; i++) await change(i + 1);
    await page.evaluate(() => {
      window.__benchUpdateDurations = [];
      window.__benchUpdateStages = [];
    });
    const cdp = profileFile ? await page.context().newCDPSession(page) : null;
    if (cdp) {
      await cdp.send("Profiler.enable");
      await cdp.send("Profiler.setSamplingInterval", { interval: 200 });
      await cdp.send("Profiler.start");
    }
    if (traceFile) await browser.startTracing(page, { path: traceFile, categories: ["devtools.timeline"] });
    for (let i = 0; i < CHANGES; i++) await change(i);
    if (traceFile) {
      await browser.stopTracing();
      log(`Trace written to ${traceFile}`);
    }
    if (cdp && profileFile) {
      const { profile } = await cdp.send("Profiler.stop");
      fs.writeFileSync(profileFile, JSON.stringify(profile));
      log(`CPU profile written to ${profileFile}`);
    }
    const { durations, stages } = await page.evaluate(() => ({
      durations: window.__benchUpdateDurations ?? [],
      stages: (window.__benchUpdateStages ?? []) as Stages[],
    }));
    const stage = (name: keyof Stages) => quantile(stages.map((s) => s[name]), 0.5);
    const result = {
      changes: durations.length,
      median_ms: quantile(durations, 0.5),
      p90_ms: quantile(durations, 0.9),
      target_ms: TARGET_MS,
      stage_medians_ms: {
        edit_to_sent: stage("toSend"),
        solve: stage("solve"),
        engine_in_worker: stage("engine"),
        render: stage("render"),
        plot: stage("plot"),
      },
      durations_ms: durations,
    };
    if (json) console.log(JSON.stringify(result, null, 2));
    else {
      const f = (ms: number) => `${ms.toFixed(1)} ms`;
      const m = result.stage_medians_ms;
      console.log(`value change → plots drawn, ${result.changes} changes in Chromium`);
      console.log(`  median ${f(result.median_ms)}   p90 ${f(result.p90_ms)}   target < ${TARGET_MS} ms`);
      console.log(
        `  stage medians: edit → sent ${f(m.edit_to_sent)}, worker round trip ${f(m.solve)} (engine ${f(m.engine_in_worker)}), render ${f(m.render)}, Plotly ${f(m.plot)}`,
      );
    }
  } finally {
    await browser.close();
    await app.stop();
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
