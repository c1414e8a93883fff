/**
 * Several server processes sharing one port (scripts/lib/next-cluster.mjs, `npm run loadtest -- --workers N`): the
 * primary runs the given number of workers, any of them answers, a worker that dies is replaced, and stopping the
 * primary stops them all. Process trees are read from Linux's /proc (task/<pid>/children).
 */
import fs from "node:fs";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { type AppServer, startAppServer } from "../../scripts/lib/app-server";
import { TEST_DIST_DIR, TEST_SECRET } from "../setup/app";

const databaseUrl = inject("databaseUrl");

function children(pid: number): number[] {
  const file = `/proc/${pid}/task/${pid}/children`;
  if (!fs.existsSync(file)) return [];
  return fs.readFileSync(file, "utf8").trim().split(/\s+/).filter(Boolean).map(Number);
}

const alive = (pid: number) => fs.existsSync(`/proc/${pid}`);

async function waitFor(check: () => boolean, what: string, ms = 30_000) {
  const deadline = Date.now() + ms;
  while (!check()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

describe("the app served by two worker processes", () => {
  let app: AppServer;

  beforeAll(async () => {
    app = await startAppServer({
      distDir: TEST_DIST_DIR,
      secret: TEST_SECRET,
      env: { DATABASE_URL: databaseUrl },
      workers: 2,
    });
  }, 90_000);

  afterAll(async () => {
    await app?.stop();
  });

  it("answers from either worker, replaces one that dies, and stops them all with the primary", async () => {
    await waitFor(() => children(app.pid).length === 2, "two workers");
    const statuses = await Promise.all(
      Array.from({ length: 40 }, async () => (await fetch(`${app.baseUrl}/api/health`)).status),
    );
    expect(statuses.every((s) => s === 200)).toBe(true);

    const [first, second] = children(app.pid);
    process.kill(first, "SIGKILL");
    await waitFor(() => !alive(first), "the killed worker to go");
    await waitFor(() => children(app.pid).length === 2 && !children(app.pid).includes(first), "a new worker");
    expect(children(app.pid)).toContain(second);
    // the new worker is listening once health answers through it as well as through the old one
    const after = await Promise.all(
      Array.from({ length: 20 }, async () => (await fetch(`${app.baseUrl}/api/health`)).status),
    );
    expect(after.every((s) => s === 200)).toBe(true);

    const workers = children(app.pid);
    await app.stop();
    await waitFor(
      () => !alive(app.pid) && workers.every((pid) => !alive(pid)),
      "the primary and its workers to stop",
      5000,
    );
  }, 90_000);
});
