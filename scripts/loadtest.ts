/**
 * `npm run loadtest`: throwaway services, the demo seed, the built app (the app tests' build, rebuilt only when the
 * sources changed) on 127.0.0.1, then the scenarios of scripts/lib/loadtest.ts in their full form. Prints each
 * scenario's throughput, latency and errors, writes tests/output/loadtest.json, and exits 1 when a target is missed.
 * Options: --connections N (50), --duration S (10 per read scenario), --rounds N (20), --writers N (20),
 * --profile DIR (the server writes a V8 CPU profile there when it stops; open it in Chromium's dev tools),
 * --workers N (1: server processes sharing the port, scripts/lib/next-cluster.mjs).
 */
import fs from "node:fs";
import path from "node:path";
import { seedDemo } from "../db/seed";
import { startAppServer } from "./lib/app-server";
import { buildIfStale } from "./lib/build";
import { PROJECT_ROOT } from "./lib/config";
import { formatRead, type LoadtestReport, runLoadtest } from "./lib/loadtest";
import { startTestServices } from "./lib/services";

/** The targets the README states: reads at 50 connections answer within 100 ms at p99 with no error. */
const READ_P99_TARGET_MS = 100;

function option(name: string, fallback: number): number {
  const at = process.argv.indexOf(`--${name}`);
  if (at < 0) return fallback;
  const value = Number(process.argv[at + 1]);
  if (!Number.isInteger(value) || value < 1)
    throw new Error(`--${name} needs a whole number of 1 or more, such as --${name} ${fallback}.`);
  return value;
}

function textOption(name: string): string | undefined {
  const at = process.argv.indexOf(`--${name}`);
  if (at < 0) return undefined;
  const value = process.argv[at + 1];
  if (!value || value.startsWith("--"))
    throw new Error(`--${name} needs a value, such as --${name} tests/output/profile.`);
  return value;
}

function missedTargets(report: LoadtestReport): string[] {
  const missed: string[] = [];
  for (const read of report.reads) {
    if (read.errors > 0) missed.push(`${read.name}: ${read.errors} errors (statuses ${JSON.stringify(read.statuses)})`);
    if (read.latencyMs.p99 >= READ_P99_TARGET_MS)
      missed.push(`${read.name}: p99 ${read.latencyMs.p99} ms, target < ${READ_P99_TARGET_MS} ms`);
  }
  const w = report.writes;
  if (w.cleanRounds !== w.rounds)
    missed.push(`saves: ${w.rounds - w.cleanRounds} rounds without exactly one 201 and the rest 409`);
  const db = w.database;
  if (
    db.revisions !== w.rounds + 1 ||
    !db.numbersContiguous ||
    !db.parentsChain ||
    !db.winnersStored ||
    !db.headIsLast
  ) {
    missed.push(`saves: the database history is wrong (${JSON.stringify(db)})`);
  }
  return missed;
}

async function main() {
  const log = (line: string) => console.log(`[loadtest] ${line}`);
  const options = {
    connections: option("connections", 50),
    durationSeconds: option("duration", 10),
    rounds: option("rounds", 20),
    writers: option("writers", 20),
  };
  const distDir = process.env.BACKPLATE_TEST_DIST_DIR || ".next-test";
  const services = await startTestServices();
  try {
    await seedDemo(services.databaseUrl);
    buildIfStale(distDir, log);
    const profileDir = textOption("profile");
    const server = await startAppServer({
      distDir,
      env: services.env,
      secret: "loadtest-secret-not-for-production",
      nodeFlags: profileDir ? ["--cpu-prof", `--cpu-prof-dir=${path.resolve(profileDir)}`] : [],
      workers: option("workers", 1),
    });
    try {
      log(`app at ${server.baseUrl}; ${JSON.stringify(options)}`);
      const report = await runLoadtest({ ...options, baseUrl: server.baseUrl, databaseUrl: services.databaseUrl }, log);
      const out = path.join(PROJECT_ROOT, "tests", "output", "loadtest.json");
      fs.mkdirSync(path.dirname(out), { recursive: true });
      fs.writeFileSync(out, `${JSON.stringify(report, null, 2)}\n`);
      console.log("\nReads");
      for (const read of report.reads) console.log(formatRead(read));
      log(`report written to ${path.relative(PROJECT_ROOT, out)}`);
      const missed = missedTargets(report);
      for (const line of missed) console.log(`MISSED ${line}`);
      if (missed.length === 0) console.log("Every target met.");
      process.exitCode = missed.length === 0 ? 0 : 1;
    } finally {
      await server.stop();
    }
  } finally {
    await services.stop();
  }
}

main().catch((error) => {
  console.error(`[loadtest] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
