import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { Pool } from "pg";
import { afterAll, describe, expect, it } from "vitest";
import { ClusterError, destroyCluster, findPostgresBin, freePort, startCluster } from "../../scripts/lib/postgres";

const root = fs.mkdtempSync(path.join(os.tmpdir(), "backplate-launcher-"));
fs.chmodSync(root, 0o755);
const dataDir = path.join(root, "pg");

afterAll(() => {
  destroyCluster(dataDir);
  fs.rmSync(root, { recursive: true, force: true });
});

describe("private PostgreSQL launcher", () => {
  it("finds Debian's binaries", () => {
    expect(findPostgresBin()).toMatch(/bin$/);
  });

  it("creates a cluster, starts idempotently and answers on 127.0.0.1 only", async () => {
    const port = await freePort();
    const first = await startCluster({ dataDir, port, database: "launcher_check", throwaway: true });
    expect(first.startedHere).toBe(true);
    const second = await startCluster({ dataDir, port, database: "launcher_check", throwaway: true });
    expect(second.startedHere).toBe(false);
    const pool = new Pool({ connectionString: first.url });
    const { rows } = await pool.query("SHOW listen_addresses");
    await pool.end();
    expect(rows[0].listen_addresses).toBe("127.0.0.1");
    first.stop();
  });

  it("says clearly when the port is taken by another program", async () => {
    const blocker = net.createServer();
    const port = await freePort();
    await new Promise<void>((resolve) => blocker.listen(port, "127.0.0.1", resolve));
    try {
      await expect(startCluster({ dataDir, port, database: "launcher_check", throwaway: true })).rejects.toThrow(
        ClusterError,
      );
      await expect(startCluster({ dataDir, port, database: "launcher_check", throwaway: true })).rejects.toThrow(
        /Port \d+ on 127\.0\.0\.1 is taken.*BACKPLATE_PG_PORT/,
      );
    } finally {
      blocker.close();
    }
  });
});
