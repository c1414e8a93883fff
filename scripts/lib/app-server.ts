/**
 * Starts the built app (`next start`) on 127.0.0.1 and a free port, pointed at the services it is given, and waits
 * until /api/health answers 200. Used by the app tests' global setup, their fault tests (which run a second server
 * on services they can stop) and `npm run loadtest`.
 */
import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";
import { PROJECT_ROOT } from "./config";
import { freePort } from "./postgres";

const READY_TIMEOUT_MS = 60_000;
/** How long a server may take to stop after SIGTERM before it is killed. */
const STOP_GRACE_MS = 3000;

export interface AppServer {
  baseUrl: string;
  /** the server's process (with several workers, their primary) */
  pid: number;
  /** what the server printed so far (for failure messages) */
  log(): string;
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

/** `env` holds the services' variables (DATABASE_URL, SMTP_URL, S3_*) and anything else the server should see. */
export async function startAppServer(options: {
  distDir: string;
  env: Record<string, string>;
  secret: string;
  /** extra Node.js flags for the server process (e.g. `--cpu-prof`, for `npm run loadtest -- --profile`) */
  nodeFlags?: string[];
  /** server processes sharing the port (next-cluster.mjs); 1, the default, is plain `next start` */
  workers?: number;
}): Promise<AppServer> {
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const nextBin = path.join(PROJECT_ROOT, "node_modules", "next", "dist", "bin", "next");
  const workers = options.workers ?? 1;
  const launcher =
    workers > 1 ? [path.join(PROJECT_ROOT, "scripts", "lib", "next-cluster.mjs"), String(workers)] : [nextBin];
  const args = [...(options.nodeFlags ?? []), ...launcher, "start", "-H", "127.0.0.1", "-p", String(port)];
  const server = spawn(process.execPath, args, {
    cwd: PROJECT_ROOT,
    stdio: ["ignore", "pipe", "pipe"],
    env: {
      ...process.env,
      ...options.env,
      BACKPLATE_DIST_DIR: options.distDir,
      NEXTAUTH_URL: baseUrl,
      NEXTAUTH_SECRET: options.secret,
      NEXT_TELEMETRY_DISABLED: "1",
    },
  });
  let serverLog = "";
  server.stdout?.on("data", (chunk) => (serverLog += chunk));
  server.stderr?.on("data", (chunk) => (serverLog += chunk));
  const stop = async () => {
    if (server.exitCode !== null || server.signalCode !== null) return;
    server.kill("SIGTERM");
    // a primary with workers takes a moment longer: it stops each worker first
    for (
      let waited = 0;
      waited < STOP_GRACE_MS && server.exitCode === null && server.signalCode === null;
      waited += 100
    )
      await new Promise((resolve) => setTimeout(resolve, 100));
    if (server.exitCode === null && server.signalCode === null) server.kill("SIGKILL");
  };
  try {
    await waitForHealth(baseUrl, server);
  } catch (error) {
    await stop();
    throw new Error(`${error instanceof Error ? error.message : error}\n${serverLog}`);
  }
  return { baseUrl, pid: server.pid as number, log: () => serverLog, stop };
}
