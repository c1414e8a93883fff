/**
 * Starts everything for a person trying Backplate: PostgreSQL, migrations, the demo seed, a build when the sources
 * changed, and the server on http://127.0.0.1:3000. Ctrl-C stops all of it. `--dev` serves with the dev server;
 * `--workers N` serves the build from N processes sharing the port (scripts/lib/next-cluster.mjs), for a machine
 * with cores to spare.
 */
import { type ChildProcess, spawn } from "node:child_process";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../db/demo-people";
import { seedDemo } from "../db/seed";
import { buildIfStale } from "./lib/build";
import { launcherConfig, PROJECT_ROOT } from "./lib/config";
import { startDevServices } from "./lib/services";

const dev = process.argv.includes("--dev");

/** `--workers N`: how many server processes share the port (1 unless asked). */
function workersOption(): number {
  const at = process.argv.indexOf("--workers");
  if (at < 0) return 1;
  const value = Number(process.argv[at + 1]);
  if (!Number.isInteger(value) || value < 1 || value > 64) {
    throw new Error("--workers needs a whole number from 1 to 64, such as --workers 2 (one per core to spare).");
  }
  if (dev && value > 1) throw new Error("--workers serves the production build; leave it out with --dev.");
  return value;
}
const log = (line: string) => console.log(`[backplate] ${line}`);

/** A stable secret for signed cookies, made once per clone unless NEXTAUTH_SECRET is set. */
function sessionSecret(): string {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const file = path.join(PROJECT_ROOT, ".data", "session-secret");
  if (!fs.existsSync(file)) {
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, randomBytes(32).toString("hex"), { mode: 0o600 });
  }
  return fs.readFileSync(file, "utf8").trim();
}

async function main() {
  const workers = workersOption();
  const services = await startDevServices(log);
  await seedDemo(services.databaseUrl);
  log("Demo data seeded");
  if (!dev) buildIfStale(".next", log);

  const { host, port } = launcherConfig;
  const url = `http://${host}:${port}`;
  const next = path.join(PROJECT_ROOT, "node_modules", ".bin", "next");
  const serve = [dev ? "dev" : "start", "-H", host, "-p", String(port)];
  const cluster = path.join(PROJECT_ROOT, "scripts", "lib", "next-cluster.mjs");
  const [command, args] = workers > 1 ? [process.execPath, [cluster, String(workers), ...serve]] : [next, serve];
  const server: ChildProcess = spawn(command, args, {
    cwd: PROJECT_ROOT,
    stdio: "inherit",
    env: {
      ...process.env,
      ...services.env,
      NEXTAUTH_URL: process.env.NEXTAUTH_URL ?? url,
      NEXTAUTH_SECRET: sessionSecret(),
      NEXT_TELEMETRY_DISABLED: "1",
    },
  });

  let stopping = false;
  const stop = async (code: number) => {
    if (stopping) return;
    stopping = true;
    log("Stopping…");
    server.kill("SIGTERM");
    await services.stop();
    log("Stopped");
    process.exit(code);
  };
  process.on("SIGINT", () => void stop(0));
  process.on("SIGTERM", () => void stop(0));
  server.on("exit", (code) => void stop(code ?? 0));

  log(`Backplate is at ${url}${workers > 1 ? ` (${workers} server processes)` : ""}`);
  log(`Demo sign-in (password for all: ${DEMO_PASSWORD}):`);
  for (const person of DEMO_PEOPLE) log(`  ${person.role.padEnd(9)} ${person.email}  (${person.name})`);
  log("Press Ctrl-C to stop the app and the services it started.");
}

main().catch((error) => {
  console.error(`[backplate] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
