/**
 * Bad input on every route and method on disk (the table is checked against app/**\/route.ts, so a new route
 * without a row fails), sent as the role that may make the call, over HTTP to the built app:
 * - malformed JSON → 400 whose message says the body is not JSON and what to send;
 * - each field of the route's zod schema given a value of the wrong type → 422 (the project's invalid_input,
 *   db/errors.ts) whose message names the field;
 * - a body one byte over the route's limit → 413 naming the limit; uploads too, checked before the file's type;
 * - each id in the path unknown → 404, and another workspace's → 404; an id a body carries → 404 or 422 naming the
 *   field, the very same answer for an unknown id and another workspace's (nothing about elsewhere leaks);
 * - after every one of them the stored data is byte-for-byte what it was (every table a route writes).
 * The statuses are HTTP's meanings (RFC 9110: 400 unparseable, 404 no such resource, 413 content too large;
 * RFC 4918: 422 well-formed but wrong); what a bad value is comes from each field's declared zod type.
 */
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { ZodType } from "zod";
import { MAX_ATTACHMENT_BYTES } from "../../components/schemas/attachment";
import { MAX_MEASUREMENT_BYTES } from "../../components/measurements/read-table";
import { accountUpdateSchema, passwordResetCompleteSchema, passwordResetRequestSchema, signUpSchema } from "../../components/schemas/account";
import { createBenchLinkSchema } from "../../components/schemas/design-bench-link";
import { createDesignSchema, circuitObjectSchema, forkDesignSchema, listDesignsQuerySchema, MAX_CIRCUIT_BYTES, renameDesignSchema, restoreRevisionSchema, saveRevisionSchema } from "../../components/schemas/design";
import { measurementMappingSchema } from "../../components/schemas/measurement";
import { attachReportSchema } from "../../components/schemas/report";
import { createRemarkSchema, createReviewSchema, decisionSchema, markReadSchema, notificationPreferencesSchema, resolveRemarkSchema } from "../../components/schemas/review";
import { auditQuerySchema, invitationCreateSchema, invitationRevokeSchema, memberRemoveSchema, memberRoleChangeSchema, workspaceCreateSchema, workspaceSettingsSchema } from "../../components/schemas/workspace";
import { DEMO_WORKSPACE } from "../../db/demo-people";
import { type DemoRole, demoCircuit, foreignWorkspace, Pool, signInAll, workspaceIdOf } from "./design-fixtures";
import { type HttpSession, originHeader } from "./http-session";
import { type Method, tableMismatch } from "./routes-on-disk";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });
afterAll(() => pool.end());

/** Limits the routes declare (app/_server/respond.ts's default, the designs API's save limit, the circuit file's). */
const JSON_LIMIT = 1_000_000;
const SAVE_LIMIT = 1_100_000;

interface Ids {
  ws: string;
  design: string;
  revision: string;
  review: string;
  remark: string;
  link: string;
  measurement: string;
  attachment: string;
  invitation: string;
  /** a member of the workspace (the demo viewer) */
  member: string;
  /** someone who may review in the workspace (the demo reviewer) */
  reviewer: string;
  /** a bench-link or invitation token (43 base64url characters) */
  token: string;
}

/** Path parameter → the id it holds. */
const PARAM: Record<string, keyof Ids> = {
  workspaceId: "ws",
  designId: "design",
  revisionId: "revision",
  reviewId: "review",
  remarkId: "remark",
  linkId: "link",
  measurementId: "measurement",
  attachmentId: "attachment",
  token: "token",
};

type JsonInput = {
  kind: "json";
  schema: ZodType;
  /** a body the schema accepts; sent only together with a wrong id, so it never changes anything */
  valid: (ids: Ids) => Record<string, unknown>;
  limit: number;
};
type UploadInput = { kind: "upload"; what: "attachment" | "measurement"; limit: number };
type NoInput = { kind: "none"; why: string };

interface Case {
  as: DemoRole | "anonymous";
  input: JsonInput | UploadInput | NoInput;
  /** the path when the route's own is not callable as written (next-auth's catch-all) */
  path?: string;
  /** a query string the route reads: field → a value its schema refuses */
  badQuery?: { schema?: ZodType; values: Record<string, string> };
  /** body fields holding ids: an unknown one and (where it can exist) another workspace's answer 404 too */
  bodyIds?: Record<string, keyof Ids>;
  /** no foreign variant for these params (a token names no workspace a caller could be outside of) */
  noForeign?: (keyof Ids)[];
}

const none = (why: string): NoInput => ({ kind: "none", why });
const json = (schema: ZodType, valid: JsonInput["valid"], limit = JSON_LIMIT): JsonInput => ({ kind: "json", schema, valid, limit });
const NO_BODY = none("reads no body: only its ids can be wrong");

const CASES: Record<string, Partial<Record<Method, Case>>> = {
  "/api/health": { GET: { as: "anonymous", input: none("takes nothing") } },
  "/api/auth/[...nextauth]": {
    GET: { as: "anonymous", input: none("next-auth's own endpoints"), path: "/api/auth/csrf" },
    POST: { as: "anonymous", input: none("next-auth's form-encoded endpoints with their own CSRF check"), path: "/api/auth/signout" },
  },
  "/api/account/sign-up": { POST: { as: "anonymous", input: json(signUpSchema, () => ({ name: "Wren Testperson", email: "wren@people.example", password: "long-enough-password-1" })) } },
  "/api/account/password-reset": {
    POST: { as: "anonymous", input: json(passwordResetRequestSchema, () => ({ email: "nobody@people.example" })) },
    PUT: { as: "anonymous", input: json(passwordResetCompleteSchema, (i) => ({ token: i.token, password: "long-enough-password-1" })), bodyIds: { token: "token" }, noForeign: ["token"] },
  },
  "/api/invitations/[token]": {
    GET: { as: "anonymous", input: NO_BODY, noForeign: ["token"] },
    POST: { as: "designer", input: NO_BODY, noForeign: ["token"] },
  },
  "/api/bench-links/[token]": { GET: { as: "designer", input: NO_BODY } },
  "/b/gone": { GET: { as: "anonymous", input: none("a fixed page; an unknown reason gets the general text") } },
  "/api/dev/mail": { GET: { as: "anonymous", input: none("the local mail fake's catch") } },
  "/api/account": {
    GET: { as: "designer", input: none("the caller's own account") },
    PATCH: { as: "designer", input: json(accountUpdateSchema, () => ({ name: "Tomas Renamed" })) },
  },
  "/api/notifications": {
    GET: { as: "designer", input: none("the caller's own inbox; ?unread=1 or anything else") },
    POST: { as: "designer", input: json(markReadSchema, () => ({ ids: [randomUUID()] })) },
  },
  "/api/notifications/preferences": {
    GET: { as: "designer", input: none("the caller's own choices") },
    PUT: { as: "designer", input: json(notificationPreferencesSchema, () => ({ emailEnabled: true, email: {} })) },
  },
  "/api/workspaces": {
    GET: { as: "designer", input: none("the caller's own workspaces") },
    POST: { as: "designer", input: json(workspaceCreateSchema, () => ({ name: "Never made" })) },
  },
  "/api/workspaces/[workspaceId]": {
    PATCH: { as: "owner", input: json(workspaceSettingsSchema, () => ({ name: "Larkfield renamed" })) },
    DELETE: { as: "owner", input: NO_BODY },
  },
  "/api/workspaces/[workspaceId]/audit": {
    GET: { as: "owner", input: NO_BODY, badQuery: { schema: auditQuerySchema, values: { before: "yesterday", limit: "many" } } },
  },
  "/api/workspaces/[workspaceId]/members": {
    GET: { as: "designer", input: NO_BODY },
    PATCH: { as: "owner", input: json(memberRoleChangeSchema, (i) => ({ userId: i.member, role: "viewer" })), bodyIds: { userId: "member" } },
    DELETE: { as: "owner", input: json(memberRemoveSchema, (i) => ({ userId: i.member })), bodyIds: { userId: "member" } },
  },
  "/api/workspaces/[workspaceId]/invitations": {
    GET: { as: "owner", input: NO_BODY },
    POST: { as: "owner", input: json(invitationCreateSchema, () => ({ email: "never-invited@people.example", role: "viewer" })) },
    DELETE: { as: "owner", input: json(invitationRevokeSchema, (i) => ({ invitationId: i.invitation })), bodyIds: { invitationId: "invitation" } },
  },
  "/api/workspaces/[workspaceId]/designs": {
    GET: {
      as: "designer",
      input: NO_BODY,
      badQuery: {
        schema: listDesignsQuerySchema,
        values: { q: "x".repeat(201), sort: "colour", dir: "sideways", status: "lost", author: "someone", page: "first", pageSize: "1000", show: "all" },
      },
    },
    POST: { as: "designer", input: json(createDesignSchema, () => ({ title: "Never made" }), SAVE_LIMIT) },
  },
  "/api/workspaces/[workspaceId]/designs/import": {
    POST: { as: "designer", input: json(circuitObjectSchema, () => demoCircuit(), MAX_CIRCUIT_BYTES), badQuery: { values: { title: " " } } },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]": {
    GET: { as: "designer", input: NO_BODY },
    PATCH: { as: "designer", input: json(renameDesignSchema, () => ({ title: "Renamed" })) },
    DELETE: { as: "designer", input: NO_BODY },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/restore": { POST: { as: "designer", input: NO_BODY } },
  "/api/workspaces/[workspaceId]/designs/[designId]/fork": {
    POST: {
      as: "designer",
      input: json(forkDesignSchema, (i) => ({ targetWorkspaceId: i.ws, revisionId: i.revision, title: "Never forked" })),
      bodyIds: { targetWorkspaceId: "ws", revisionId: "revision" },
    },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions": {
    GET: { as: "designer", input: NO_BODY },
    // parentRevisionId is not checked for 404: a parent that is not the head is a stale save, 409 by design
    POST: { as: "designer", input: json(saveRevisionSchema, (i) => ({ parentRevisionId: i.revision, circuit: demoCircuit(), message: "never saved" }), SAVE_LIMIT) },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]": { GET: { as: "designer", input: NO_BODY } },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/restore": {
    POST: { as: "designer", input: json(restoreRevisionSchema, (i) => ({ parentRevisionId: i.revision })) },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/export": { GET: { as: "designer", input: NO_BODY } },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/report": { GET: { as: "designer", input: NO_BODY } },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/report/attach": {
    POST: { as: "designer", input: json(attachReportSchema, (i) => ({ reviewId: i.review })), bodyIds: { reviewId: "review" } },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/bench-links": {
    GET: { as: "designer", input: NO_BODY },
    POST: { as: "designer", input: json(createBenchLinkSchema, (i) => ({ revisionId: i.revision, isPublic: false })), bodyIds: { revisionId: "revision" } },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/bench-links/[linkId]": { DELETE: { as: "designer", input: NO_BODY } },
  "/api/workspaces/[workspaceId]/designs/[designId]/measurements": {
    GET: { as: "designer", input: NO_BODY },
    POST: { as: "designer", input: { kind: "upload", what: "measurement", limit: MAX_MEASUREMENT_BYTES } },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/measurements/[measurementId]": {
    GET: { as: "designer", input: NO_BODY },
    DELETE: { as: "designer", input: NO_BODY },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/attachments": {
    GET: { as: "designer", input: NO_BODY, badQuery: { values: { reviewId: "not-an-id" } } },
    POST: { as: "designer", input: { kind: "upload", what: "attachment", limit: MAX_ATTACHMENT_BYTES } },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/attachments/[attachmentId]": {
    GET: { as: "designer", input: NO_BODY },
    DELETE: { as: "designer", input: NO_BODY },
  },
  "/api/designs/[designId]/reviews": {
    GET: { as: "designer", input: NO_BODY },
    POST: { as: "designer", input: json(createReviewSchema, (i) => ({ revisionId: i.revision, reviewerIds: [i.reviewer] })), bodyIds: { revisionId: "revision", reviewerIds: "reviewer" } },
  },
  "/api/designs/[designId]/revisions/[revisionId]/checks": {
    GET: { as: "designer", input: NO_BODY },
    POST: { as: "designer", input: NO_BODY },
  },
  "/api/reviews/[reviewId]": { GET: { as: "reviewer", input: NO_BODY } },
  "/api/reviews/[reviewId]/remarks": {
    POST: { as: "reviewer", input: json(createRemarkSchema, () => ({ body: "Never said.", anchor: { type: "part", part: "J1" } })) },
  },
  "/api/reviews/[reviewId]/decisions": {
    POST: { as: "reviewer", input: json(decisionSchema, () => ({ verdict: "rework", reason: "Never decided." })) },
  },
  "/api/remarks/[remarkId]": { PATCH: { as: "reviewer", input: json(resolveRemarkSchema, () => ({ resolved: true })) } },
};

// ——— calling ———

let as: Record<DemoRole, HttpSession>;
let ids: Ids;
let foreign: Ids;
let callCount = 0;

/** A different documentation address per anonymous call (RFC 5737), so the sign-up and reset limits never trip. */
const freshAddress = () => `198.51.100.${(callCount++ % 250) + 1}, 10.${callCount % 250}.0.1`;

function pathOf(route: string, c: Case, values: Ids): string {
  if (c.path) return c.path;
  return route.replace(/\[([^\]]+)\]/g, (_m, param: string) => values[PARAM[param]]);
}

interface Sent {
  body?: string | FormData;
  type?: string;
}

function send(c: Case, method: Method, path: string, sent: Sent = {}): Promise<Response> {
  const headers: Record<string, string> = { ...originHeader(baseUrl) };
  if (sent.type) headers["content-type"] = sent.type;
  if (c.as === "anonymous") headers["x-forwarded-for"] = freshAddress();
  else headers.cookie = as[c.as].cookie;
  return fetch(`${baseUrl}${path}`, { method, headers, body: sent.body, redirect: "manual" });
}

const sendJson = (c: Case, method: Method, path: string, body: unknown) =>
  send(c, method, path, { body: typeof body === "string" ? body : JSON.stringify(body), type: "application/json" });

/** The multipart body of a valid upload of either kind, with `change` applied to its fields. */
function uploadForm(what: UploadInput["what"], change: (form: FormData) => void = () => {}): FormData {
  const form = new FormData();
  if (what === "measurement") {
    form.set("file", new Blob(["Frequency (Hz),Level (dB)\n20,-1\n200,0\n2000,0.5\n"]), "sweep.csv");
    form.set("mapping", JSON.stringify(VALID_MAPPING));
  } else {
    form.set("file", new Blob(["Bench notes: all well."]), "notes.txt");
    form.set("caption", "Notes");
  }
  change(form);
  return form;
}
const VALID_MAPPING = { kind: "frequency_response", name: "Rig sweep", frequencyColumn: 0, levelColumn: 1, phaseColumn: null, frequencyUnit: "Hz", levelUnit: "dB" };

// ——— what "unchanged" means ———

/** Every table a route writes, row by row (rate-limit counters aside: they count bad calls on purpose). */
const WRITTEN_TABLES = [
  "users",
  "workspaces",
  "memberships",
  "invitations",
  "designs",
  "design_revisions",
  "share_links",
  "reviews",
  "review_reviewers",
  "remarks",
  "decisions",
  "measurements",
  "attachments",
  "notification_preferences",
  "audit_log",
  "password_reset_tokens",
];

async function snapshot(): Promise<Record<string, string>> {
  const parts = WRITTEN_TABLES.map((t) => `(SELECT md5(coalesce(string_agg(x::text, '|' ORDER BY x::text), '')) FROM ${t} x) AS ${t}`);
  // notifications: what a request could change (a row, its read mark), not the mailer's own progress on it
  parts.push("(SELECT md5(coalesce(string_agg(id::text || ':' || coalesce(read_at::text, ''), '|' ORDER BY id), '')) FROM notifications) AS notifications");
  parts.push(`(SELECT count(*)::text FROM design_revisions WHERE design_id = '${ids.design}') AS fixture_revisions`);
  const { rows } = await pool.query(`SELECT ${parts.join(", ")}`);
  return rows[0];
}

// ——— the fixtures: Larkfield's own things, and another workspace's ———

async function larkfield(): Promise<Ids> {
  const ws = await workspaceIdOf(pool, DEMO_WORKSPACE.slug);
  const { rows: people } = await pool.query("SELECT id, email FROM users WHERE email = ANY($1)", [["margit@larkfield.example", "felix@larkfield.example"]]);
  const idOf = (email: string) => people.find((p) => p.email === email).id as string;
  const created = await as.designer.fetch(`/api/workspaces/${ws}/designs`, { method: "POST", body: { title: "Bad input target", circuit: demoCircuit() } });
  expect(created.status).toBe(201);
  const { design, revisionId } = await created.json();
  const d = `/api/workspaces/${ws}/designs/${design.id}`;
  const link = await as.designer.fetch(`${d}/bench-links`, { method: "POST", body: {} });
  expect(link.status).toBe(201);
  const review = await as.designer.fetch(`/api/designs/${design.id}/reviews`, { method: "POST", body: { revisionId, reviewerIds: [idOf("margit@larkfield.example")] } });
  expect(review.status, await review.clone().text()).toBe(201);
  const reviewId = (await review.json()).review.id;
  const remark = await as.reviewer.fetch(`/api/reviews/${reviewId}/remarks`, { method: "POST", body: { body: "Check J1.", anchor: { type: "part", part: "J1" } } });
  expect(remark.status).toBe(201);
  const upload = (what: UploadInput["what"]) =>
    fetch(`${baseUrl}${d}/${what}s`, { method: "POST", body: uploadForm(what), headers: { cookie: as.designer.cookie, ...originHeader(baseUrl) } });
  const measurement = await upload("measurement");
  expect(measurement.status, await measurement.clone().text()).toBe(201);
  const attachment = await upload("attachment");
  expect(attachment.status, await attachment.clone().text()).toBe(201);
  const invitation = await as.owner.fetch(`/api/workspaces/${ws}/invitations`, { method: "POST", body: { email: `bad-input-${randomUUID().slice(0, 8)}@people.example`, role: "viewer" } });
  expect(invitation.status).toBe(201);
  return {
    ws,
    design: design.id,
    revision: revisionId,
    review: reviewId,
    remark: (await remark.json()).remark.id,
    link: (await link.json()).link.id,
    measurement: (await measurement.json()).measurement.id,
    attachment: (await attachment.json()).attachment.id,
    invitation: (await invitation.json()).invitation.id,
    member: idOf("felix@larkfield.example"),
    reviewer: idOf("margit@larkfield.example"),
    token: "T".repeat(43),
  };
}

/** Another workspace with one of everything, written straight into PostgreSQL (nobody in the demo belongs to it). */
async function elsewhere(): Promise<Ids> {
  const { workspaceId, designId, revisionId } = await foreignWorkspace(pool);
  const one = async (sql: string, values: unknown[]) => (await pool.query(`${sql} RETURNING id`, values)).rows[0].id as string;
  const { rows: [owner] } = await pool.query("SELECT user_id AS id FROM memberships WHERE workspace_id = $1", [workspaceId]);
  const token = randomBytes(32).toString("base64url");
  const link = await one("INSERT INTO share_links (design_id, token_hash, created_by) VALUES ($1, $2, $3)", [designId, createHash("sha256").update(token).digest("hex"), owner.id]);
  const review = await one("INSERT INTO reviews (design_id, revision_id, requested_by) VALUES ($1, $2, $3)", [designId, revisionId, owner.id]);
  const remark = await one("INSERT INTO remarks (design_id, revision_id, review_id, author_id, body, anchor) VALUES ($1, $2, $3, $4, 'Hollin remark', '{\"type\":\"part\",\"part\":\"J1\"}')", [designId, revisionId, review, owner.id]);
  const measurement = await one(
    "INSERT INTO measurements (design_id, kind, name, storage_key, original_filename, size_bytes, data, uploaded_by) VALUES ($1, 'frequency_response', 'Hollin sweep', 'hollin/m.csv', 'm.csv', 10, '{\"frequency\":[20,200],\"level_db\":[0,0]}', $2)",
    [designId, owner.id],
  );
  const attachment = await one(
    "INSERT INTO attachments (design_id, storage_key, filename, content_type, size_bytes, uploaded_by) VALUES ($1, 'hollin/a.txt', 'a.txt', 'text/plain; charset=utf-8', 5, $2)",
    [designId, owner.id],
  );
  const invitation = await one(
    "INSERT INTO invitations (workspace_id, email, role, token_hash, invited_by, expires_at) VALUES ($1, 'hollin-guest@people.example', 'viewer', $2, $3, now() + interval '1 day')",
    [workspaceId, createHash("sha256").update(randomUUID()).digest("hex"), owner.id],
  );
  return { ws: workspaceId, design: designId, revision: revisionId, review, remark, link, measurement, attachment, invitation, member: owner.id, reviewer: owner.id, token };
}

beforeAll(async () => {
  as = await signInAll(baseUrl);
  ids = await larkfield();
  foreign = await elsewhere();
  // The set-up's own after-effects (the notification mailer) settle before the first comparison.
  let before = await snapshot();
  for (let i = 0; i < 20; i++) {
    await new Promise((resolve) => setTimeout(resolve, 500));
    const now = await snapshot();
    if (JSON.stringify(now) === JSON.stringify(before)) break;
    before = now;
  }
}, 240_000);

// ——— the checks ———

interface Problem {
  call: string;
  problem: string;
}

/** Runs one bad call, checks its answer, and checks nothing stored changed; returns what went wrong, if anything. */
async function expectRefused(label: string, call: () => Promise<Response>, status: number, message?: RegExp): Promise<Problem[]> {
  const before = await snapshot();
  const response = await call();
  const text = await response.text();
  const problems: Problem[] = [];
  if (response.status !== status) problems.push({ call: label, problem: `${response.status}, expected ${status}: ${text.slice(0, 200)}` });
  else if (message) {
    let parsed: { error?: { message?: string } } = {};
    try {
      parsed = JSON.parse(text);
    } catch {
      problems.push({ call: label, problem: `answer is not JSON: ${text.slice(0, 120)}` });
    }
    const said = parsed.error?.message ?? "";
    if (!message.test(said)) problems.push({ call: label, problem: `message "${said}" does not match ${message}` });
  }
  const after = await snapshot();
  const changed = Object.keys(before).filter((k) => before[k] !== after[k]);
  if (changed.length > 0) problems.push({ call: label, problem: `stored data changed: ${changed.join(", ")}` });
  return problems;
}

/** A value of the wrong type for a field, tried in turn until the schema itself refuses it at that field. */
const WRONG_TYPES: unknown[] = [12345, "not-a-value", true, ["x"], { x: 1 }];

function fieldsOf(schema: ZodType): string[] {
  const def = (schema as unknown as { def: { type: string; options?: ZodType[] } }).def;
  if (def.type === "union" && def.options) return fieldsOf(def.options[0]);
  const shape = (schema as unknown as { shape?: Record<string, unknown> }).shape;
  return shape ? Object.keys(shape) : [];
}

function wrongValueFor(schema: ZodType, valid: Record<string, unknown>, field: string): unknown {
  for (const candidate of WRONG_TYPES) {
    const result = schema.safeParse({ ...valid, [field]: candidate });
    if (!result.success && result.error.issues.some((i) => i.path[0] === field || (i.code === "invalid_union" && i.path.length === 0))) return candidate;
  }
  throw new Error(`no wrong value found for ${field}: fix the test's candidates`);
}

/** The limit as the server words it (app/_server/respond.ts and read-upload.ts: megabytes to one decimal). */
const mb = (bytes: number) => `${Math.round(bytes / 100_000) / 10} MB`;
const reEscape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

async function badBodies(route: string, method: Method, c: Case): Promise<Problem[]> {
  const path = pathOf(route, c, ids);
  const label = (what: string) => `${method} ${route} ${what}`;
  const problems: Problem[] = [];
  const input = c.input;
  if (input.kind === "json") {
    expect(input.schema.safeParse(input.valid(ids)).success, `${method} ${route}: the table's valid body must be valid`).toBe(true);
    problems.push(...(await expectRefused(label("malformed JSON"), () => sendJson(c, method, path, '{"oops": '), 400, /not valid JSON.*Send one JSON object/)));
    const fields = fieldsOf(input.schema);
    if (fields.length === 0) {
      // a record (the circuit file): the body as a whole is of the wrong type
      expect((input.schema as unknown as { def: { type: string } }).def.type, `${method} ${route}: a schema without fields`).toBe("record");
      for (const whole of [[1, 2], "a string", 12345]) {
        problems.push(...(await expectRefused(label(`body ${JSON.stringify(whole)}`), () => sendJson(c, method, path, JSON.stringify(whole)), 422, /request body/i)));
      }
    }
    for (const field of fields) {
      const wrong = wrongValueFor(input.schema, input.valid(ids), field);
      const body = { ...input.valid(ids), [field]: wrong };
      problems.push(...(await expectRefused(label(`${field}: ${JSON.stringify(wrong)}`), () => sendJson(c, method, path, body), 422, new RegExp(`^${reEscape(field)}\\b`))));
    }
    const huge = JSON.stringify({ padding: "x".repeat(input.limit) });
    problems.push(...(await expectRefused(label(`body over ${input.limit} bytes`), () => sendJson(c, method, path, huge), 413, new RegExp(reEscape(mb(input.limit))))));
  }
  if (input.kind === "upload") {
    const sendForm = (form: FormData) => send(c, method, path, { body: form });
    problems.push(...(await expectRefused(label("not multipart"), () => sendJson(c, method, path, { file: "x" }), 415, /multipart\/form-data/)));
    // Junk of no known type, one byte over the limit: the size is refused before the type is looked at.
    const over = new Uint8Array(input.limit + 1).fill(0x07);
    const name = input.what === "measurement" ? "sweep.csv" : "mystery.bin";
    problems.push(...(await expectRefused(label(`file over ${mb(input.limit)}`), () => sendForm(uploadForm(input.what, (f) => f.set("file", new Blob([over]), name))), 413, new RegExp(`larger than ${reEscape(mb(input.limit))}`))));
    problems.push(...(await expectRefused(label("file given as text"), () => sendForm(uploadForm(input.what, (f) => f.set("file", "just text"))), 422, /Choose a/)));
    if (input.what === "measurement") {
      problems.push(...(await expectRefused(label("mapping not JSON"), () => sendForm(uploadForm("measurement", (f) => f.set("mapping", "{kind"))), 400, /column mapping/)));
      for (const field of fieldsOf(measurementMappingSchema)) {
        const wrong = wrongValueFor(measurementMappingSchema, VALID_MAPPING, field);
        const form = uploadForm("measurement", (f) => f.set("mapping", JSON.stringify({ ...VALID_MAPPING, [field]: wrong })));
        problems.push(...(await expectRefused(label(`mapping.${field}: ${JSON.stringify(wrong)}`), () => sendForm(form), 422, new RegExp(`^${reEscape(field)}\\b`))));
      }
    } else {
      problems.push(...(await expectRefused(label("caption too long"), () => sendForm(uploadForm("attachment", (f) => f.set("caption", "c".repeat(201)))), 422, /^caption\b/)));
      problems.push(...(await expectRefused(label("reviewId not an id"), () => sendForm(uploadForm("attachment", (f) => f.set("reviewId", "review-1"))), 422, /^reviewId\b/)));
    }
  }
  if (c.badQuery) {
    const { schema, values } = c.badQuery;
    if (schema) {
      const shape = fieldsOf(schema);
      expect(Object.keys(values).sort(), `${method} ${route}: a bad value for every query field`).toEqual(shape.sort());
    }
    for (const [field, value] of Object.entries(values)) {
      if (schema) expect(schema.safeParse({ [field]: value }).success, `${field}=${value} must be wrong`).toBe(false);
      const query = `${path}${path.includes("?") ? "&" : "?"}${field}=${encodeURIComponent(value)}`;
      const body = input.kind === "json" ? JSON.stringify(input.valid(ids)) : undefined;
      problems.push(...(await expectRefused(label(`?${field}=${value.slice(0, 20)}`), () => send(c, method, query, { body, type: body ? "application/json" : undefined }), 422, new RegExp(`^${reEscape(field)}\\b`))));
    }
  }
  return problems;
}

/** The valid body of a case (or an upload), so only the one wrong id can be what the route refuses. */
function validCall(c: Case, method: Method, path: string, values: Ids): Promise<Response> {
  const input = c.input;
  if (input.kind === "json") return sendJson(c, method, path, input.valid(values));
  if (input.kind === "upload") return send(c, method, path, { body: uploadForm(input.what) });
  return send(c, method, path);
}

async function wrongIds(route: string, method: Method, c: Case): Promise<Problem[]> {
  const problems: Problem[] = [];
  const params = [...route.matchAll(/\[([^\].]+)\]/g)].map((m) => PARAM[m[1]]).filter(Boolean);
  const unknown: Ids = { ...ids, ...Object.fromEntries(Object.keys(ids).map((k) => [k, randomUUID()])), token: "U".repeat(43) } as Ids;
  const variants: { what: string; key: keyof Ids; value: Ids }[] = [];
  for (const key of params) {
    variants.push({ what: `unknown ${key}`, key, value: { ...ids, [key]: unknown[key] } });
    if (!c.noForeign?.includes(key)) variants.push({ what: `another workspace's ${key}`, key, value: { ...ids, [key]: foreign[key] } });
  }
  for (const { what, value } of variants) {
    problems.push(...(await expectRefused(`${method} ${route} ${what}`, () => validCall(c, method, pathOf(route, c, value), value), 404)));
  }
  // An id in the body names something the request points at, not the resource it acts on: 404, or 422 naming the
  // field (which one to pick again). Either way an unknown id and another workspace's get the very same answer, so
  // the answer reveals nothing about what exists elsewhere.
  for (const [field, key] of Object.entries(c.bodyIds ?? {})) {
    const input = c.input as JsonInput;
    const path = pathOf(route, c, ids);
    const valid = input.valid(ids);
    const bodyWith = (v: string) => ({ ...valid, [field]: Array.isArray(valid[field]) ? [v] : v });
    const label = `${method} ${route} body ${field}`;
    const answers: { status: number; text: string }[] = [];
    const values = c.noForeign?.includes(key) ? [unknown[key]] : [unknown[key], foreign[key]];
    for (const v of values) {
      const before = await snapshot();
      const response = await sendJson(c, method, path, bodyWith(v));
      answers.push({ status: response.status, text: await response.text() });
      const after = await snapshot();
      const changed = Object.keys(before).filter((k) => before[k] !== after[k]);
      if (changed.length > 0) problems.push({ call: `${label} = ${v}`, problem: `stored data changed: ${changed.join(", ")}` });
    }
    for (const answer of answers) {
      const named = answer.status === 422 && JSON.parse(answer.text).error?.fields?.[field] !== undefined;
      if (answer.status !== 404 && !named) problems.push({ call: label, problem: `${answer.status}, expected 404 or 422 naming ${field}: ${answer.text.slice(0, 200)}` });
    }
    if (answers.length === 2 && (answers[0].status !== answers[1].status || answers[0].text !== answers[1].text)) {
      problems.push({ call: label, problem: `an unknown id and another workspace's are told apart: ${answers[0].text.slice(0, 120)} / ${answers[1].text.slice(0, 120)}` });
    }
  }
  return problems;
}

describe("bad input on every route", () => {
  it("has a row for every route and method on disk, and none for what is gone", () => {
    const { missing, stale } = tableMismatch(CASES);
    expect(missing, "routes without a bad-input row: add each to CASES").toEqual([]);
    expect(stale, "rows for routes that no longer exist").toEqual([]);
  });

  it("refuses malformed JSON, wrong types, oversized bodies and uploads with a message, and stores nothing", async () => {
    const problems: Problem[] = [];
    for (const [route, methods] of Object.entries(CASES)) {
      for (const [method, c] of Object.entries(methods) as [Method, Case][]) problems.push(...(await badBodies(route, method, c)));
    }
    expect(problems).toEqual([]);
  }, 600_000);

  it("takes an attachment whole just under its limit (past the 10 MB a proxied body is cut at unless configured)", async () => {
    const size = MAX_ATTACHMENT_BYTES - 1_000;
    const form = new FormData();
    form.set("file", new Blob([new Uint8Array(size).fill(0x61)]), "long-log.txt");
    const path = `/api/workspaces/${ids.ws}/designs/${ids.design}/attachments`;
    const sent = await fetch(`${baseUrl}${path}`, { method: "POST", body: form, headers: { cookie: as.designer.cookie, ...originHeader(baseUrl) } });
    expect(sent.status, await sent.clone().text()).toBe(201);
    const { attachment } = await sent.json();
    const { rows } = await pool.query("SELECT size_bytes FROM attachments WHERE id = $1", [attachment.id]);
    expect(rows[0].size_bytes).toBe(size);
    const download = await as.designer.fetch(`${path}/${attachment.id}`);
    expect((await download.arrayBuffer()).byteLength).toBe(size);
    expect((await as.designer.fetch(`${path}/${attachment.id}`, { method: "DELETE" })).status).toBe(204);
  }, 120_000);

  it("answers 404 to unknown ids and to another workspace's ids, in the path and in the body, and stores nothing", async () => {
    const problems: Problem[] = [];
    for (const [route, methods] of Object.entries(CASES)) {
      for (const [method, c] of Object.entries(methods) as [Method, Case][]) problems.push(...(await wrongIds(route, method, c)));
    }
    expect(problems).toEqual([]);
    // the fixture design is still there with its one revision (the check every call above made, stated once more)
    const { rows } = await pool.query("SELECT d.title, d.deleted_at, count(r.id)::int AS revisions FROM designs d JOIN design_revisions r ON r.design_id = d.id WHERE d.id = $1 GROUP BY d.id", [ids.design]);
    expect(rows[0]).toEqual({ title: "Bad input target", deleted_at: null, revisions: 1 });
  }, 600_000);
});
