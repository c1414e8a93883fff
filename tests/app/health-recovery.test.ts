import { describe, expect, inject, it } from "vitest";
import { startCluster, stopCluster } from "../../scripts/lib/postgres";

const baseUrl = inject("baseUrl");
const pgDataDir = inject("pgDataDir");
const pgPort = inject("pgPort");

async function health() {
  const response = await fetch(`${baseUrl}/api/health`);
  return { status: response.status, body: await response.json() };
}

describe("/api/health while PostgreSQL stops and starts under the running app", () => {
  it("turns 503 with a readable message, then 200 again without restarting the app", async () => {
    expect((await health()).status).toBe(200);
    stopCluster(pgDataDir);
    try {
      const down = await health();
      expect(down.status).toBe(503);
      expect(down.body.status).toBe("unavailable");
      expect(down.body.database.message).toMatch(/PostgreSQL is not answering/);
      expect(down.body.database.message).toMatch(/npm run db:start|DATABASE_URL/);
    } finally {
      await startCluster({ dataDir: pgDataDir, port: pgPort, database: "backplate_test", throwaway: true });
    }
    const up = await health();
    expect(up.status).toBe(200);
    expect(up.body.database.ok).toBe(true);
  });
});
