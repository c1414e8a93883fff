/**
 * PostgreSQL stopped and started again under a write load on the running app (the cluster is controlled as in
 * health-recovery.test.ts): while it is down every save is refused with 503 and a JSON body that says to try again;
 * every save that was answered 2xx is in the database afterwards, in an unbroken history; and saves succeed again
 * without restarting the app.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_WORKSPACE } from "../../db/demo-people";
import { startCluster, stopCluster } from "../../scripts/lib/postgres";
import { type DemoRole, demoCircuit, Pool, signInAll, workspaceIdOf } from "./design-fixtures";
import type { HttpSession } from "./http-session";

const baseUrl = inject("baseUrl");
const pgDataDir = inject("pgDataDir");
const pgPort = inject("pgPort");
const pool = new Pool({ connectionString: inject("databaseUrl"), max: 2 });
pool.on("error", () => {}); // the test's own idle connections die with the cluster too
afterAll(() => pool.end());

const WRITERS = 4;
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

interface Writer {
  designId: string;
  parent: string;
  /** ids of the revisions answered 201 */
  saved: string[];
  refused: { status: number; body: unknown; retryAfter: string | null }[];
}

let as: Record<DemoRole, HttpSession>;
let ws: string;

beforeAll(async () => {
  as = await signInAll(baseUrl);
  ws = await workspaceIdOf(pool, DEMO_WORKSPACE.slug);
});

async function newWriter(i: number): Promise<Writer> {
  const created = await as.designer.fetch(`/api/workspaces/${ws}/designs`, { method: "POST", body: { title: `Outage writer ${i}`, circuit: demoCircuit() }, headers: { origin: baseUrl } });
  expect(created.status).toBe(201);
  const { design, revisionId } = await created.json();
  return { designId: design.id, parent: revisionId, saved: [], refused: [] };
}

/** One save on top of the writer's last answered head. */
async function saveOnce(writer: Writer, n: number): Promise<number> {
  const circuit = demoCircuit() as { parameters: Record<string, string> };
  circuit.parameters.RS = `${1 + (n % 90)}k`;
  let response: Response;
  try {
    response = await as.designer.fetch(`/api/workspaces/${ws}/designs/${writer.designId}/revisions`, {
      method: "POST",
      body: { parentRevisionId: writer.parent, circuit, message: `outage save ${n}` },
      headers: { origin: baseUrl },
    });
  } catch (error) {
    writer.refused.push({ status: 0, body: String(error), retryAfter: null });
    return 0;
  }
  const body = await response.json();
  if (response.status === 201) {
    writer.saved.push(body.revision.id);
    writer.parent = body.revision.id;
  } else {
    writer.refused.push({ status: response.status, body, retryAfter: response.headers.get("retry-after") });
    // A save that committed while its answer was lost moves the head; the 409 names it, so carry on from there.
    if (response.status === 409 && body.error?.detail?.headRevisionId) writer.parent = body.error.detail.headRevisionId;
  }
  return response.status;
}

describe("saving while PostgreSQL stops and starts", () => {
  it("answers 503 with a readable body while it is down, loses nothing answered 201, and recovers by itself", async () => {
    const writers = await Promise.all(Array.from({ length: WRITERS }, (_, i) => newWriter(i + 1)));
    let phase: "before" | "down" | "after" = "before";
    const byPhase = { before: [] as number[], down: [] as number[], after: [] as number[] };
    let running = true;
    let n = 0;
    const loops = writers.map(async (writer) => {
      while (running) {
        const at = phase;
        n += 1;
        byPhase[at].push(await saveOnce(writer, n));
        await sleep(20);
      }
    });
    await sleep(1_500);
    phase = "down";
    stopCluster(pgDataDir);
    try {
      await sleep(2_500);
    } finally {
      phase = "after";
      await startCluster({ dataDir: pgDataDir, port: pgPort, database: "backplate_test", throwaway: true });
    }
    // keep saving until every writer has saved again after the restart (or 30 s pass)
    const deadline = Date.now() + 30_000;
    const savedBefore = writers.map((w) => w.saved.length);
    while (Date.now() < deadline && writers.some((w, i) => w.saved.length <= savedBefore[i])) await sleep(200);
    running = false;
    await Promise.all(loops);

    expect(byPhase.before.filter((s) => s === 201).length).toBeGreaterThan(0);
    // While the cluster is down, saves are refused with 503 (never a 500 or a hang).
    expect(byPhase.down.filter((s) => s === 503).length).toBeGreaterThan(0);
    expect(writers.every((w, i) => w.saved.length > savedBefore[i])).toBe(true);
    for (const refusal of writers.flatMap((w) => w.refused)) {
      if (refusal.status === 409) continue; // the head moved under a lost answer (handled above)
      expect(refusal.status).toBe(503);
      expect(refusal.retryAfter).toBe("5");
      const error = (refusal.body as { error: { code: string; message: string } }).error;
      expect(error.code).toBe("unavailable");
      expect(error.message).toMatch(/The database is not answering\. Try again/);
    }
    // Every save answered 201 is stored, in order, and the history has no gap or repeat.
    for (const writer of writers) {
      const { rows } = await pool.query("SELECT id, number, parent_id FROM design_revisions WHERE design_id = $1 ORDER BY number", [writer.designId]);
      const ids = rows.map((r) => r.id);
      for (const id of writer.saved) expect(ids).toContain(id);
      expect(rows.map((r) => r.number)).toEqual(rows.map((_, i) => i + 1));
      expect(rows.slice(1).every((r, i) => r.parent_id === rows[i].id)).toBe(true);
      const { rows: [design] } = await pool.query("SELECT head_revision_id FROM designs WHERE id = $1", [writer.designId]);
      expect(design.head_revision_id).toBe(ids[ids.length - 1]);
    }
  }, 90_000);
});
