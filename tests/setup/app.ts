/**
 * Global setup of the browser project: throwaway services, the demo seed, a production build (into .next-test,
 * only when the sources changed) and `next start` on a free port. Tests read the address with
 * `inject("baseUrl")` and drive Debian's Chromium through playwright-core (tests/app/chromium.ts).
 */
import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { seedDemo } from "../../db/seed";
import { buildIfStale } from "../../scripts/lib/build";
import { PROJECT_ROOT } from "../../scripts/lib/config";
import { freePort } from "../../scripts/lib/postgres";
import { startTestServices } from "../../scripts/lib/services";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    databaseUrl: string;
    /** The throwaway cluster, so a test can stop and restart PostgreSQL under the running app. */
    pgDataDir: string;
    pgPort: number;
    /** How the app reaches the storage fake (S3_ENDPOINT, S3_BUCKET, keys), so a test can look into the bucket. */
    s3Env: Record<string, string>;
  }
}

/** Build folder of the app tests; several checkouts or runs at once can each set their own. */
export const TEST_DIST_DIR = process.env.BACKPLATE_TEST_DIST_DIR || ".next-test";
const READY_TIMEOUT_MS = 60_000;

async function waitForHealth(url: string, server: ChildProcess) {
  const deadline = Date.now() + READY_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`next start exited with code ${server.exitCode}`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.status === 200) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`The app did not answer at ${url}/api/health within ${READY_TIMEOUT_MS / 1000} s`);
}

export default async function setup(project: TestProject) {
  const services = await startTestServices();
  await seedDemo(services.databaseUrl);
  buildIfStale(TEST_DIST_DIR, (line) => console.log(`[browser setup] ${line}`));
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const server = spawn(path.join(PROJECT_ROOT, "node_modules", ".bin", "next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: PROJECT_ROOT,
    stdio: ["ignore", "pipe", "pipe"],
    env: {
      ...process.env,
      ...services.env,
      BACKPLATE_DIST_DIR: TEST_DIST_DIR,
      NEXTAUTH_URL: baseUrl,
      NEXTAUTH_SECRET: "browser-test-secret-not-for-production",
      NEXT_TELEMETRY_DISABLED: "1",
    },
  });
  let serverLog = "";
  server.stdout?.on("data", (chunk) => (serverLog += chunk));
  server.stderr?.on("data", (chunk) => (serverLog += chunk));
  try {
    await waitForHealth(baseUrl, server);
  } catch (error) {
    server.kill("SIGKILL");
    await services.stop();
    throw new Error(`${error instanceof Error ? error.message : error}\n${serverLog}`);
  }
  project.provide("baseUrl", baseUrl);
  project.provide("databaseUrl", services.databaseUrl);
  project.provide("pgDataDir", services.pgDataDir);
  project.provide("pgPort", services.pgPort);
  project.provide("s3Env", services.s3?.env ?? {});
  return async () => {
    server.kill("SIGTERM");
    await new Promise((resolve) => setTimeout(resolve, 300));
    if (server.exitCode === null) server.kill("SIGKILL");
    await services.stop();
  };
}
