/**
 * Starts what the app needs beside itself — PostgreSQL now; the mail and storage fakes join here as they arrive —
 * for `npm start` (a kept cluster under .data/) and for the tests (a throwaway cluster on a free port).
 */
import os from "node:os";
import path from "node:path";
import fs from "node:fs";
import { applyMigrations } from "../../db/migrate";
import { launcherConfig } from "./config";
import { type Cluster, destroyCluster, freePort, startCluster } from "./postgres";

export interface Services {
  databaseUrl: string;
  pgDataDir: string;
  pgPort: number;
  /** Environment variables the app needs to reach these services. */
  env: Record<string, string>;
  stop(): Promise<void>;
}

export async function startDevServices(log: (line: string) => void): Promise<Services> {
  const cluster = await startCluster({
    dataDir: launcherConfig.pgDataDir,
    port: launcherConfig.pgPort,
    database: launcherConfig.database,
    log,
  });
  await applyMigrations(cluster.url);
  log("Migrations applied");
  return wrap(cluster, false);
}

/** A fresh cluster in the system temp folder, removed by `stop()`. */
export async function startTestServices(log: (line: string) => void = () => {}): Promise<Services> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "backplate-test-"));
  fs.chmodSync(dataDir, 0o755);
  const cluster = await startCluster({
    dataDir: path.join(dataDir, "pg"),
    port: await freePort(),
    database: "backplate_test",
    throwaway: true,
    log,
  });
  await applyMigrations(cluster.url);
  const services = wrap(cluster, true);
  const stop = services.stop;
  services.stop = async () => {
    await stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
  return services;
}

function wrap(cluster: Cluster, throwaway: boolean): Services {
  return {
    databaseUrl: cluster.url,
    pgDataDir: cluster.dataDir,
    pgPort: cluster.port,
    env: { DATABASE_URL: cluster.url },
    async stop() {
      if (throwaway) destroyCluster(cluster.dataDir);
      else cluster.stop();
    },
  };
}
