/**
 * The load test's scenarios against a running app, signed in as the demo people: reads (the designs list, one
 * design through the API and as a page, a bench link as a page and through its API) driven by autocannon at a given
 * number of connections, and rounds of concurrent saves on one design from the same parent revision, checked in
 * the database afterwards. `npm run loadtest` runs the full form (scripts/loadtest.ts); tests/app/loadtest.test.ts
 * a short one for the correctness properties.
 */
import os from "node:os";
import autocannon from "autocannon";
import { Pool } from "pg";
import { DEMO_PASSWORD, DEMO_WORKSPACE } from "../../db/demo-people";
import demo from "../../sim/examples/demo-microphone.json";
import { type HttpSession, signInWithPassword } from "../../tests/app/http-session";

export interface LoadtestOptions {
  baseUrl: string;
  databaseUrl: string;
  /** connections of each read scenario */
  connections: number;
  /** each read scenario runs for this many seconds … */
  durationSeconds?: number;
  /** … or until this many requests are answered (the short form) */
  amount?: number;
  /** rounds of concurrent saves, and how many people save at once in each */
  rounds: number;
  writers: number;
}

export interface ReadScenario {
  name: string;
  path: string;
  connections: number;
  requests: number;
  throughputPerSecond: number;
  latencyMs: { p50: number; p90: number; p99: number; max: number };
  errors: number;
  /** status code → count */
  statuses: Record<string, number>;
}

export interface WriteScenario {
  name: string;
  rounds: number;
  writers: number;
  /** rounds in which exactly one save answered 201 and every other 409 */
  cleanRounds: number;
  created: number;
  conflicts: number;
  /** answers that were neither 201 nor a 409 naming the winner as head */
  unexpected: { status: number; body: string }[];
  latencyMs: { p50: number; p90: number; p99: number; max: number };
  throughputPerSecond: number;
  /** what the database holds for the design afterwards */
  database: { revisions: number; numbersContiguous: boolean; parentsChain: boolean; winnersStored: boolean; headIsLast: boolean };
}

export interface LoadtestReport {
  startedAt: string;
  machine: { cpus: number; loadAverage: number[] };
  reads: ReadScenario[];
  writes: WriteScenario;
}

/** Writers sign in as the demo people who may save (owner and designers), in turn. */
const SAVERS = ["orla@larkfield.example", "tomas@larkfield.example", "ines@larkfield.example"];
const READER = "margit@larkfield.example";

async function signIn(baseUrl: string, email: string): Promise<HttpSession> {
  const result = await signInWithPassword(baseUrl, email, DEMO_PASSWORD);
  if (!result.ok) throw new Error(`sign-in as ${email} failed: ${result.error}`);
  return result.session;
}

/** Nearest-rank percentile (common practice), in ms, of unsorted samples. */
export function percentile(samples: number[], p: number): number {
  if (samples.length === 0) return 0;
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

async function readScenario(options: LoadtestOptions, name: string, path: string, headers: Record<string, string>): Promise<ReadScenario> {
  const result = await autocannon({
    url: `${options.baseUrl}${path}`,
    connections: options.connections,
    ...(options.amount ? { amount: options.amount } : { duration: options.durationSeconds ?? 10 }),
    timeout: 10,
    headers,
  });
  const statuses = Object.fromEntries(Object.entries(result.statusCodeStats).map(([code, { count }]) => [code, count]));
  return {
    name,
    path,
    connections: options.connections,
    requests: result.requests.total,
    throughputPerSecond: Math.round(result.requests.total / Math.max(result.duration, 0.001)),
    latencyMs: { p50: result.latency.p50, p90: result.latency.p90, p99: result.latency.p99, max: result.latency.max },
    errors: result.errors + result.timeouts + result.non2xx,
    statuses,
  };
}

async function post(session: HttpSession, origin: string, path: string, body: unknown): Promise<Response> {
  return session.fetch(path, { method: "POST", body, headers: { origin } });
}

/**
 * `writers` people save the same design at once, all from the head they read; the winner's revision is the next
 * round's parent. Every loser must get 409 naming the winner as the head.
 */
async function concurrentSaves(options: LoadtestOptions, pool: Pool, workspaceId: string, savers: HttpSession[]): Promise<WriteScenario> {
  const origin = options.baseUrl;
  const base = `/api/workspaces/${workspaceId}/designs`;
  const created = await post(savers[0], origin, base, { title: `Load test ${new Date().toISOString()}`, circuit: demo });
  if (created.status !== 201) throw new Error(`creating the load-test design answered ${created.status}: ${await created.text()}`);
  const { design, revisionId } = (await created.json()) as { design: { id: string }; revisionId: string };
  const winners: string[] = [];
  const latencies: number[] = [];
  const unexpected: WriteScenario["unexpected"] = [];
  let parent = revisionId;
  let cleanRounds = 0;
  let conflicts = 0;
  const started = performance.now();
  for (let round = 1; round <= options.rounds; round += 1) {
    const answers = await Promise.all(
      Array.from({ length: options.writers }, async (_, writer) => {
        const circuit = structuredClone(demo) as { parameters: Record<string, string> };
        circuit.parameters.RS = `${1 + ((round * options.writers + writer) % 90)}k`;
        const t0 = performance.now();
        const response = await post(savers[writer % savers.length], origin, `${base}/${design.id}/revisions`, {
          parentRevisionId: parent,
          circuit,
          message: `round ${round}, writer ${writer + 1}`,
        });
        const body = await response.text();
        latencies.push(performance.now() - t0);
        return { status: response.status, body };
      }),
    );
    const won = answers.filter((a) => a.status === 201);
    const winnerId = won.length === 1 ? (JSON.parse(won[0].body) as { revision: { id: string } }).revision.id : null;
    let roundConflicts = 0;
    for (const answer of answers) {
      if (answer.status === 201) continue;
      const head = answer.status === 409 ? (JSON.parse(answer.body) as { error: { detail?: { headRevisionId?: string } } }).error.detail?.headRevisionId : undefined;
      if (answer.status === 409 && head === winnerId) roundConflicts += 1;
      else unexpected.push({ status: answer.status, body: answer.body.slice(0, 300) });
    }
    conflicts += roundConflicts;
    if (winnerId && roundConflicts === options.writers - 1) cleanRounds += 1;
    for (const w of won) winners.push((JSON.parse(w.body) as { revision: { id: string } }).revision.id);
    if (!winnerId) break; // no single head to build the next round on
    parent = winnerId;
  }
  const seconds = (performance.now() - started) / 1000;
  return {
    name: "save revisions concurrently (same parent)",
    rounds: options.rounds,
    writers: options.writers,
    cleanRounds,
    created: winners.length,
    conflicts,
    unexpected,
    latencyMs: { p50: percentile(latencies, 50), p90: percentile(latencies, 90), p99: percentile(latencies, 99), max: Math.max(...latencies) },
    throughputPerSecond: Math.round(latencies.length / seconds),
    database: await checkHistory(pool, design.id, revisionId, winners),
  };
}

/** The design's history as PostgreSQL holds it: r1 … rN with no gap or repeat, each revision's parent the one before. */
async function checkHistory(pool: Pool, designId: string, firstId: string, winners: string[]): Promise<WriteScenario["database"]> {
  const { rows } = await pool.query<{ id: string; number: number; parent_id: string | null }>(
    "SELECT id, number, parent_id FROM design_revisions WHERE design_id = $1 ORDER BY number",
    [designId],
  );
  const { rows: [head] } = await pool.query<{ head_revision_id: string }>("SELECT head_revision_id FROM designs WHERE id = $1", [designId]);
  const ids = rows.map((r) => r.id);
  return {
    revisions: rows.length,
    numbersContiguous: rows.every((r, i) => r.number === i + 1),
    parentsChain: rows.every((r, i) => (i === 0 ? r.parent_id === null : r.parent_id === rows[i - 1].id)),
    winnersStored: ids[0] === firstId && winners.every((id, i) => ids[i + 1] === id) && ids.length === winners.length + 1,
    headIsLast: head?.head_revision_id === ids[ids.length - 1],
  };
}

/**
 * Waits until the app answers /api/health quickly again (or 30 s pass): autocannon stops sending at the end of a
 * scenario, but the server still works off what it had queued, which would otherwise count against the next one.
 */
async function settle(baseUrl: string): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    const t0 = performance.now();
    const ok = await fetch(`${baseUrl}/api/health`).then((r) => r.ok, () => false);
    if (ok && performance.now() - t0 < 100) return;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

export async function runLoadtest(options: LoadtestOptions, log: (line: string) => void = () => {}): Promise<LoadtestReport> {
  const pool = new Pool({ connectionString: options.databaseUrl, max: 2 });
  try {
    const { rows: [workspace] } = await pool.query<{ id: string }>("SELECT id FROM workspaces WHERE slug = $1", [DEMO_WORKSPACE.slug]);
    if (!workspace) throw new Error(`The demo workspace "${DEMO_WORKSPACE.slug}" is missing: seed the database first.`);
    const reader = await signIn(options.baseUrl, READER);
    const savers = await Promise.all(SAVERS.map((email) => signIn(options.baseUrl, email)));
    const headers = { cookie: reader.cookie, origin: options.baseUrl };
    const { rows: [design] } = await pool.query<{ id: string }>(
      "SELECT id FROM designs WHERE workspace_id = $1 AND deleted_at IS NULL ORDER BY created_at LIMIT 1",
      [workspace.id],
    );
    const link = await post(savers[0], options.baseUrl, `/api/workspaces/${workspace.id}/designs/${design.id}/bench-links`, { label: "Load test", isPublic: true });
    if (link.status !== 201) throw new Error(`creating a bench link answered ${link.status}: ${await link.text()}`);
    const { token } = (await link.json()) as { token: string };
    const scenarios: [string, string][] = [
      ["designs list (API)", `/api/workspaces/${workspace.id}/designs`],
      ["designs list (page)", `/w/${DEMO_WORKSPACE.slug}`],
      ["open a design (API)", `/api/workspaces/${workspace.id}/designs/${design.id}`],
      ["open a design (page)", `/w/${DEMO_WORKSPACE.slug}/designs/${design.id}`],
      ["bench link (page)", `/b/${token}`],
      ["bench link (API)", `/api/bench-links/${token}`],
    ];
    const reads: ReadScenario[] = [];
    for (const [name, path] of scenarios) {
      await settle(options.baseUrl);
      log(`${name}: ${path}`);
      const scenario = await readScenario(options, name, path, headers);
      log(formatRead(scenario));
      reads.push(scenario);
    }
    log(`concurrent saves: ${options.rounds} rounds × ${options.writers} writers`);
    const writes = await concurrentSaves(options, pool, workspace.id, savers);
    log(formatWrite(writes));
    return { startedAt: new Date().toISOString(), machine: { cpus: os.cpus().length, loadAverage: os.loadavg() }, reads, writes };
  } finally {
    await pool.end();
  }
}

const ms = (v: number) => `${v.toFixed(0)} ms`;

export function formatRead(s: ReadScenario): string {
  return `  ${s.name.padEnd(22)} ${String(s.throughputPerSecond).padStart(5)} req/s  p50 ${ms(s.latencyMs.p50)}  p90 ${ms(s.latencyMs.p90)}  p99 ${ms(s.latencyMs.p99)}  errors ${s.errors}  (${s.requests} requests, ${s.connections} connections)`;
}

export function formatWrite(w: WriteScenario): string {
  const db = w.database;
  return (
    `  ${w.name}: ${w.cleanRounds}/${w.rounds} rounds with one 201 and ${w.writers - 1}×409, ${w.created} created, ${w.conflicts} conflicts, ` +
    `${w.unexpected.length} unexpected; ${w.throughputPerSecond} saves/s p50 ${ms(w.latencyMs.p50)} p90 ${ms(w.latencyMs.p90)} p99 ${ms(w.latencyMs.p99)}; ` +
    `database: ${db.revisions} revisions, contiguous ${db.numbersContiguous}, chain ${db.parentsChain}, winners stored ${db.winnersStored}, head last ${db.headIsLast}`
  );
}
