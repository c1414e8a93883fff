/**
 * The mail fake and the storage fake going down under a running app. This file runs its own app server on its own
 * database (in the run's cluster) with its own fakes, so it can stop them without touching the other tests' app:
 * - mail down: requesting a review and saving still answer 201; the reviewer's notifications stay queued (pending,
 *   the refusal recorded) and go out exactly once when the mail server is back (the retry loop of instrumentation.ts);
 * - storage down: an upload is refused with 503 and a message that says nothing was stored; no row, no object stays;
 *   the next upload after storage is back succeeds.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_WORKSPACE } from "../../db/demo-people";
import { applyMigrations } from "../../db/migrate";
import { seedDemo } from "../../db/seed";
import { type AppServer, startAppServer } from "../../scripts/lib/app-server";
import { type MailFake, startMailFake } from "../../scripts/lib/mail-fake";
import { freePort } from "../../scripts/lib/postgres";
import { type S3Fake, startS3Fake } from "../../scripts/lib/s3-fake";
import { TEST_DIST_DIR, TEST_SECRET } from "../setup/app";
import { testS3 } from "../integration/storage-client";
import { DEMO, demoCircuit, Pool } from "./design-fixtures";
import { type HttpSession, signInWithPassword } from "./http-session";

const clusterUrl = inject("databaseUrl");
const database = `outage_${randomUUID().slice(0, 8)}`;
const databaseUrl = Object.assign(new URL(clusterUrl), { pathname: `/${database}` }).toString();
const folder = fs.mkdtempSync(path.join(os.tmpdir(), "backplate-outage-"));
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

let admin: Pool;
let pool: Pool;
let mail: MailFake;
let storage: S3Fake;
let app: AppServer;
let designer: HttpSession;
let workspaceId: string;
let design: { id: string; head: string };
let margitId: string;

beforeAll(async () => {
  admin = new Pool({ connectionString: clusterUrl, max: 1 });
  await admin.query(`CREATE DATABASE ${database}`);
  await applyMigrations(databaseUrl);
  await seedDemo(databaseUrl);
  pool = new Pool({ connectionString: databaseUrl, max: 2 });
  mail = await startMailFake({ port: await freePort(), dir: path.join(folder, "mail") });
  storage = await startS3Fake({ port: await freePort(), dir: path.join(folder, "s3") });
  app = await startAppServer({
    distDir: TEST_DIST_DIR,
    secret: TEST_SECRET,
    env: { DATABASE_URL: databaseUrl, SMTP_URL: `smtp://127.0.0.1:${mail.port}`, BACKPLATE_MAIL_FAKE_DIR: mail.dir, ...storage.env },
  });
  const signedIn = await signInWithPassword(app.baseUrl, DEMO.designer, DEMO_PASSWORD);
  expect(signedIn.ok).toBe(true);
  designer = signedIn.session;
  workspaceId = (await pool.query("SELECT id FROM workspaces WHERE slug = $1", [DEMO_WORKSPACE.slug])).rows[0].id;
  margitId = (await pool.query("SELECT id FROM users WHERE email = $1", [DEMO.reviewer])).rows[0].id;
  const created = await designer.fetch(`/api/workspaces/${workspaceId}/designs`, { method: "POST", body: { title: "Outage bench", circuit: demoCircuit() }, headers: { origin: app.baseUrl } });
  expect(created.status).toBe(201);
  const body = await created.json();
  design = { id: body.design.id, head: body.revisionId };
}, 300_000);

afterAll(async () => {
  await app?.stop();
  await mail?.stop();
  await storage?.stop();
  await pool?.end();
  await admin?.query(`DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
  await admin?.end();
  fs.rmSync(folder, { recursive: true, force: true });
});

/** What the mail fake received for `to` (its .json files; the app's /dev/mail reads the same folder). */
function mailTo(to: string): { subject: string }[] {
  if (!fs.existsSync(mail.dir)) return [];
  return fs
    .readdirSync(mail.dir)
    .filter((name) => name.endsWith(".json"))
    .map((name) => JSON.parse(fs.readFileSync(path.join(mail.dir, name), "utf8")) as { to: string[]; subject: string })
    .filter((m) => m.to.includes(to));
}

async function notificationsOf(userId: string, since: Date) {
  const { rows } = await pool.query(
    "SELECT kind, title, email_status, email_attempts, email_last_error FROM notifications WHERE user_id = $1 AND created_at >= $2 ORDER BY created_at",
    [userId, since],
  );
  return rows as { kind: string; title: string; email_status: string; email_attempts: number; email_last_error: string | null }[];
}

async function until<T>(what: string, probe: () => Promise<T | null | undefined | false>, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`timed out after ${timeoutMs / 1000} s waiting for ${what}`);
    await sleep(250);
  }
}

describe("the mail server down", () => {
  it("still saves and requests reviews, queues the notifications and sends each once when mail is back", async () => {
    const since = new Date((await pool.query("SELECT now() AS t")).rows[0].t);
    await mail.stop();
    const requested = await designer.fetch(`/api/designs/${design.id}/reviews`, {
      method: "POST",
      body: { revisionId: design.head, reviewerIds: [margitId], message: "Please look at the bias network." },
      headers: { origin: app.baseUrl },
    });
    expect(requested.status).toBe(201);
    const saved = await designer.fetch(`/api/workspaces/${workspaceId}/designs/${design.id}/revisions`, {
      method: "POST",
      body: { parentRevisionId: design.head, circuit: demoCircuit(), message: "Same circuit, saved while mail is down" },
      headers: { origin: app.baseUrl },
    });
    expect(saved.status).toBe(201);
    // Both notifications are in the inbox table, each tried once and refused, still pending for a retry.
    const queued = await until(
      "both mail attempts to fail",
      async () => {
        const rows = await notificationsOf(margitId, since);
        return rows.length === 2 && rows.every((r) => r.email_attempts >= 1) && rows;
      },
      20_000,
    );
    expect(queued.map((r) => r.kind).sort()).toEqual(["review.requested", "revision.created"]);
    for (const row of queued) {
      expect(row.email_status).toBe("pending");
      expect(row.email_last_error).toBe("The mail server did not take the message. Try again in a minute.");
    }
    expect(mailTo(DEMO.reviewer)).toHaveLength(0);

    // The mail server comes back on the same address; the loop's backoff (30 s after a first refusal) sends both.
    mail = await startMailFake({ port: mail.port, dir: mail.dir });
    const sent = await until(
      "the queued mail to be sent",
      async () => {
        const rows = await notificationsOf(margitId, since);
        return rows.every((r) => r.email_status === "sent") && rows;
      },
      60_000,
    );
    expect(sent).toHaveLength(2);
    await sleep(3_500); // one more turn of the loop: nothing goes out twice
    const received = mailTo(DEMO.reviewer).map((m) => m.subject).sort();
    expect(received).toHaveLength(2);
    expect(new Set(received).size).toBe(2);
    expect(received.join("\n")).toContain("New revision r2 of Outage bench");
  }, 120_000);
});

describe("file storage down", () => {
  const mapping = { kind: "frequency_response", name: "Rig sweep", frequencyColumn: 0, levelColumn: 1, phaseColumn: null, frequencyUnit: "Hz", levelUnit: "dB" };
  // a flat 1/3-octave sweep, 20 Hz – 20 kHz, as a rig writes it
  const csv = `Frequency (Hz),Level (dB)\n${Array.from({ length: 31 }, (_, i) => `${(20 * 2 ** (i / 3)).toFixed(3)},-38.0`).join("\n")}\n`;

  function upload() {
    const form = new FormData();
    form.set("file", new Blob([csv], { type: "text/csv" }), "rig-sweep.csv");
    form.set("mapping", JSON.stringify(mapping));
    return fetch(`${app.baseUrl}/api/workspaces/${workspaceId}/designs/${design.id}/measurements`, {
      method: "POST",
      body: form,
      headers: { cookie: designer.cookie, origin: app.baseUrl },
    });
  }

  async function stored() {
    const rows = (await pool.query("SELECT count(*)::int AS n FROM measurements WHERE design_id = $1", [design.id])).rows[0].n as number;
    const objects = (await testS3(storage.env).keys(`designs/${design.id}/`)).length;
    return { rows, objects };
  }

  it("refuses an upload with 503 and keeps neither a row nor an object, then takes the next one", async () => {
    await storage.stop();
    const refused = await upload();
    expect(refused.status).toBe(503);
    expect(refused.headers.get("retry-after")).toBe("5");
    const body = await refused.json();
    expect(body.error.code).toBe("unavailable");
    expect(body.error.message).toMatch(/File storage is not answering, so nothing was stored\. Try again/);
    storage = await startS3Fake({ port: storage.port, dir: storage.dir });
    expect(await stored()).toEqual({ rows: 0, objects: 0 });

    const accepted = await upload();
    expect(accepted.status).toBe(201);
    expect(await stored()).toEqual({ rows: 1, objects: 1 });
  }, 60_000);
});
