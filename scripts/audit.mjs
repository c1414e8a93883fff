#!/usr/bin/env node
/**
 * Dependency audit of what ships (`npm audit --omit=dev`): fails on any high or critical advisory that is not in
 * scripts/audit-allowlist.json (each entry: advisory id, package, why it cannot be fixed yet — see DEVELOPERS.md).
 * When the registry's audit service cannot be reached or does not answer audits, it says so in one warning line and
 * exits 3, which `npm test` counts as skipped (never as passed).
 * Exit codes: 0 clean, 1 new high/critical advisory (or allow-list broken), 3 not run.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

export const AUDIT_SKIPPED_EXIT = 3;
const root = path.resolve(import.meta.dirname, "..");
const allowListFile = path.join(import.meta.dirname, "audit-allowlist.json");
const BLOCKING = new Set(["high", "critical"]);

/** The advisories behind `npm audit --json`'s vulnerabilities map, high and critical only, deduplicated by id. */
export function blockingAdvisories(report) {
  const found = new Map();
  for (const [name, vulnerability] of Object.entries(report.vulnerabilities ?? {})) {
    for (const via of vulnerability.via ?? []) {
      if (typeof via !== "object" || !BLOCKING.has(via.severity)) continue; // strings point at another entry
      const id = via.url?.split("/").pop() || String(via.source);
      found.set(id, { id, package: via.name ?? name, severity: via.severity, title: via.title, url: via.url });
    }
  }
  return [...found.values()];
}

function readAllowList() {
  const entries = JSON.parse(fs.readFileSync(allowListFile, "utf8"));
  for (const entry of entries) {
    if (!entry.id || !entry.reason) throw new Error(`${allowListFile}: every entry needs an "id" and a "reason" (${JSON.stringify(entry)})`);
  }
  return new Map(entries.map((e) => [e.id, e]));
}

function main() {
  const result = spawnSync("npm", ["audit", "--omit=dev", "--json"], { cwd: root, encoding: "utf8", timeout: 120_000 });
  let report;
  try {
    report = JSON.parse(result.stdout);
  } catch {
    report = null;
  }
  if (!report?.vulnerabilities) {
    const why = report?.message ?? result.error?.message ?? (result.stderr.trim().split("\n").pop() || "no answer");
    console.warn(`WARNING: dependency audit NOT RUN — the registry's audit service did not answer (${why}). Counted as skipped.`);
    process.exit(AUDIT_SKIPPED_EXIT);
  }
  const allowed = readAllowList();
  const advisories = blockingAdvisories(report);
  const fresh = advisories.filter((a) => !allowed.has(a.id));
  for (const a of advisories.filter((a) => allowed.has(a.id))) console.log(`allowed  ${a.severity} ${a.id} ${a.package}: ${allowed.get(a.id).reason}`);
  for (const a of fresh) console.error(`NEW      ${a.severity} ${a.id} ${a.package}: ${a.title} ${a.url ?? ""}`);
  if (fresh.length > 0) {
    console.error(`${fresh.length} high/critical advisory(ies) in production dependencies. Upgrade, or list each in scripts/audit-allowlist.json with the reason and in DEVELOPERS.md.`);
    process.exit(1);
  }
  console.log(`dependency audit: no new high or critical advisory (${advisories.length} allowed).`);
}

if (process.argv[1] === import.meta.filename) main();
