#!/usr/bin/env node
/**
 * `npm test`: every check, in order — type check, lint, unit tests, integration tests (own PostgreSQL), app tests
 * (built app in Debian's Chromium). Installs what is missing first. Ends with one line that adds every suite up:
 * `N passed, N failed, N skipped` (the type check, the lint and the dependency audit count as one test each; an audit
 * the registry could not answer counts as skipped).
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { AUDIT_SKIPPED_EXIT } from "./audit.mjs";
import { ensureInstalled } from "./start.mjs";

const root = path.resolve(import.meta.dirname, "..");
const outputDir = path.join(root, "tests", "output");
const bin = (name) => path.join(root, "node_modules", ".bin", name);
const isRoot = process.getuid?.() === 0;
const only = process.argv.slice(2);

function ensureChromium() {
  const chromium = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
  if (fs.existsSync(chromium)) return;
  if (!isRoot) {
    console.error(`Chromium is missing at ${chromium}. Install it: sudo apt-get update && sudo apt-get install -y chromium`);
    process.exit(1);
  }
  console.log("Installing Debian's chromium for the browser tests (apt-get)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  for (const args of [["update"], ["install", "-y", "chromium"]]) {
    const result = spawnSync("apt-get", args, { stdio: "inherit", env });
    if (result.status !== 0) process.exit(result.status ?? 1);
  }
}

/** The sign-off report test turns PDF pages into images with pdftoppm (Debian's poppler-utils). */
function ensurePoppler() {
  if (fs.existsSync("/usr/bin/pdftoppm")) return;
  if (!isRoot) {
    console.error("pdftoppm is missing. Install it: sudo apt-get update && sudo apt-get install -y poppler-utils");
    process.exit(1);
  }
  console.log("Installing Debian's poppler-utils for the report tests (apt-get)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  for (const args of [["update"], ["install", "-y", "poppler-utils"]]) {
    const result = spawnSync("apt-get", args, { stdio: "inherit", env });
    if (result.status !== 0) process.exit(result.status ?? 1);
  }
}

const totals = { passed: 0, failed: 0, skipped: 0 };
const report = [];

/** `skipExit`: the exit code by which a check says it could not run (counted as skipped, never as passed). */
function runCheck(name, command, args, skipExit) {
  const started = Date.now();
  console.log(`\n▶ ${name}`);
  const result = spawnSync(command, args, { cwd: root, stdio: "inherit" });
  const outcome = result.status === 0 ? "passed" : skipExit !== undefined && result.status === skipExit ? "skipped" : "failed";
  totals[outcome] += 1;
  const mark = { passed: "ok  ", skipped: "SKIP", failed: "FAIL" }[outcome];
  report.push(`${mark} ${name} (${((Date.now() - started) / 1000).toFixed(1)} s)`);
}

function runVitest(project) {
  const started = Date.now();
  const jsonFile = path.join(outputDir, `vitest-${project}.json`);
  fs.rmSync(jsonFile, { force: true });
  console.log(`\n▶ ${project} tests`);
  const result = spawnSync(
    bin("vitest"),
    ["run", "--project", project, "--passWithNoTests", "--reporter=default", "--reporter=json", `--outputFile.json=${jsonFile}`],
    { cwd: root, stdio: "inherit", env: { ...process.env, FORCE_COLOR: process.env.CI ? "0" : "1" } },
  );
  let counts = { passed: 0, failed: 0, skipped: 0 };
  if (fs.existsSync(jsonFile)) {
    const data = JSON.parse(fs.readFileSync(jsonFile, "utf8"));
    counts = {
      passed: data.numPassedTests,
      failed: data.numFailedTests + (data.numFailedTestSuites ?? 0) * (data.numFailedTests === 0 ? 1 : 0),
      skipped: data.numPendingTests + data.numTodoTests,
    };
  }
  // A run that failed without a failing test (setup error, crash) still counts as a failure.
  if (result.status !== 0 && counts.failed === 0) counts.failed = 1;
  for (const key of Object.keys(totals)) totals[key] += counts[key];
  report.push(
    `${result.status === 0 ? "ok  " : "FAIL"} ${project}: ${counts.passed} passed, ${counts.failed} failed` +
      ` (${((Date.now() - started) / 1000).toFixed(1)} s)`,
  );
}

ensureInstalled();
fs.mkdirSync(outputDir, { recursive: true });
const want = (name) => only.length === 0 || only.includes(name);
if (want("app")) ensureChromium();
if (want("integration")) ensurePoppler();
if (want("typecheck")) runCheck("type check (tsc)", bin("tsc"), ["--noEmit", "-p", "tsconfig.json"]);
if (want("lint")) runCheck("lint (biome)", bin("biome"), ["lint", "."]);
if (want("audit")) runCheck("dependency audit (npm audit --omit=dev, high and critical)", process.execPath, [path.join(root, "scripts", "audit.mjs")], AUDIT_SKIPPED_EXIT);
for (const project of ["unit", "integration", "app"]) if (want(project)) runVitest(project);

console.log("\nSummary");
for (const line of report) console.log(`  ${line}`);
console.log(`${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped`);
process.exit(totals.failed === 0 ? 0 : 1);
