/**
 * The production build served by `next start` on a free port, beside throwaway services (PostgreSQL, mail and
 * storage fakes) with the demo seed: what the app tests and `npm run bench:ui` run against. Builds into `distDir`
 * only when the sources changed (build.ts).
 */
import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";
import { seedDemo } from "../../db/seed";
import { buildIfStale } from "./build";
import { PROJECT_ROOT } from "./config";
import { freePort } from "./postgres";
import { type Services, startTestServices } from "./services";

const READY_TIMEOUT_MS = 60_000;

export interface BuiltApp {
  baseUrl: string;
  services: Services;
  stop(): Promise<void>;
}

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

export async function startBuiltApp(distDir: string, log: (line: string) => void): Promise<BuiltApp> {
  const services = await startTestServices();
  await seedDemo(services.databaseUrl);
  try {
    buildIfStale(distDir, log);
  } catch (error) {
    await services.stop();
    throw error;
  }
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const server = spawn(path.join(PROJECT_ROOT, "node_modules", ".bin", "next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: PROJECT_ROOT,
    stdio: ["ignore", "pipe", "pipe"],
    env: {
      ...process.env,
      ...services.env,
      BACKPLATE_DIST_DIR: distDir,
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
  return {
    baseUrl,
    services,
    async stop() {
      server.kill("SIGTERM");
      await new Promise((resolve) => setTimeout(resolve, 300));
      if (server.exitCode === null) server.kill("SIGKILL");
      await services.stop();
    },
  };
}
