/**
 * Every route handler under app/ is listed here with who may call it, and each listed method is called over HTTP
 * against the built app: signed out → 401 (unless listed public, with the reason), a member of another workspace
 * using Larkfield's ids → 404 (ids of other workspaces reveal nothing), the demo viewer → 403 on anything that
 * changes a workspace's data. The route list is read from the file system, so a new route or method that is not in
 * the table fails this test. Expected roles: components/auth/roles.ts's table as the glossary states it (a viewer
 * reads only) — the product's own rule, checked against the server's answers.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_WORKSPACE } from "../../db/demo-people";
import { demoCircuit, Pool, signInAll, workspaceIdOf } from "./design-fixtures";
import { type HttpSession, originHeader } from "./http-session";
import { type Method, routesOnDisk } from "./routes-on-disk";
import { signUp } from "./people";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });
afterAll(() => pool.end());

interface Ids {
  ws: string;
  design: string;
  revision: string;
  review: string;
  remark: string;
  link: string;
  owner: string;
  /** ids of things under a design the checks reach only after the workspace check; a fresh uuid is enough there */
  unknown: string;
}
interface Call {
  path: (ids: Ids) => string;
  body?: (ids: Ids) => unknown;
  /** sent as the raw body instead of JSON.stringify(body) */
  raw?: string;
}
/** A route anyone may call: why, and what a signed-out call answers. */
interface PublicRule extends Call {
  public: string;
  signedOut: number;
}
/** A signed-in route. `viewer`: the status the demo viewer gets; `foreign`: false for a person's own data (no ids). */
interface MemberRule extends Call {
  viewer: number;
  foreign?: false;
}
type Rule = PublicRule | MemberRule;

const TOKEN = "T".repeat(43); // well-formed, unknown
const w = (ids: Ids) => `/api/workspaces/${ids.ws}`;
const d = (ids: Ids) => `${w(ids)}/designs/${ids.design}`;
const r = (ids: Ids) => `${d(ids)}/revisions/${ids.revision}`;
const MALFORMED = "{not json"; // personal routes a viewer may use: stop at validation, change nothing

const ACCESS: Record<string, Partial<Record<Method, Rule>>> = {
  "/api/health": { GET: { public: "load balancers probe it", signedOut: 200, path: () => "/api/health" } },
  "/api/auth/[...nextauth]": {
    GET: { public: "next-auth's own sign-in endpoints (they carry their own CSRF token)", signedOut: 200, path: () => "/api/auth/csrf" },
    POST: { public: "next-auth's sign-in; a POST without its CSRF token is refused", signedOut: 302, path: () => "/api/auth/signout", body: () => ({}) },
  },
  "/api/account/sign-up": { POST: { public: "making an account", signedOut: 400, path: () => "/api/account/sign-up", raw: MALFORMED } },
  "/api/account/password-reset": {
    POST: { public: "asking for a reset link", signedOut: 400, path: () => "/api/account/password-reset", raw: MALFORMED },
    PUT: { public: "setting a password with a reset token", signedOut: 404, path: () => "/api/account/password-reset", body: () => ({ token: TOKEN, password: "long-enough-password-1" }) },
  },
  "/api/invitations/[token]": {
    GET: { public: "an invitation by its token", signedOut: 404, path: () => `/api/invitations/${TOKEN}` },
    POST: { viewer: 404, foreign: false, path: () => `/api/invitations/${TOKEN}` },
  },
  "/api/bench-links/[token]": { GET: { public: "a bench link by its token", signedOut: 404, path: () => `/api/bench-links/${TOKEN}` } },
  "/b/gone": { GET: { public: "the page a dead bench link lands on", signedOut: 410, path: () => "/b/gone?reason=revoked" } },
  "/api/dev/mail": { GET: { public: "the local mail fake's catch, only while BACKPLATE_MAIL_FAKE_DIR is set (never in production)", signedOut: 200, path: () => "/api/dev/mail" } },

  "/api/account": {
    GET: { viewer: 200, foreign: false, path: () => "/api/account" },
    PATCH: { viewer: 400, foreign: false, path: () => "/api/account", raw: MALFORMED },
  },
  "/api/notifications": {
    GET: { viewer: 200, foreign: false, path: () => "/api/notifications" },
    POST: { viewer: 400, foreign: false, path: () => "/api/notifications", raw: MALFORMED },
  },
  "/api/notifications/preferences": {
    GET: { viewer: 200, foreign: false, path: () => "/api/notifications/preferences" },
    PUT: { viewer: 400, foreign: false, path: () => "/api/notifications/preferences", raw: MALFORMED },
  },
  "/api/workspaces": {
    GET: { viewer: 200, foreign: false, path: () => "/api/workspaces" },
    POST: { viewer: 400, foreign: false, path: () => "/api/workspaces", raw: MALFORMED },
  },
  "/api/workspaces/[workspaceId]": {
    PATCH: { viewer: 403, path: w, body: () => ({ name: "Taken over" }) },
    DELETE: { viewer: 403, path: w },
  },
  "/api/workspaces/[workspaceId]/audit": { GET: { viewer: 403, path: (i) => `${w(i)}/audit` } },
  "/api/workspaces/[workspaceId]/members": {
    GET: { viewer: 200, path: (i) => `${w(i)}/members` },
    PATCH: { viewer: 403, path: (i) => `${w(i)}/members`, body: (i) => ({ userId: i.owner, role: "viewer" }) },
    DELETE: { viewer: 403, path: (i) => `${w(i)}/members`, body: (i) => ({ userId: i.owner }) },
  },
  "/api/workspaces/[workspaceId]/invitations": {
    GET: { viewer: 403, path: (i) => `${w(i)}/invitations` },
    POST: { viewer: 403, path: (i) => `${w(i)}/invitations`, body: () => ({ email: "someone@people.example", role: "owner" }) },
    DELETE: { viewer: 403, path: (i) => `${w(i)}/invitations`, body: (i) => ({ id: i.unknown }) },
  },
  "/api/workspaces/[workspaceId]/designs": {
    GET: { viewer: 200, path: (i) => `${w(i)}/designs` },
    POST: { viewer: 403, path: (i) => `${w(i)}/designs`, body: () => ({ title: "Sneaked in" }) },
  },
  "/api/workspaces/[workspaceId]/designs/import": {
    POST: { viewer: 403, path: (i) => `${w(i)}/designs/import?title=Sneaked`, body: () => demoCircuit() },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]": {
    GET: { viewer: 200, path: d },
    PATCH: { viewer: 403, path: d, body: () => ({ title: "Renamed by a viewer" }) },
    DELETE: { viewer: 403, path: d },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/restore": { POST: { viewer: 403, path: (i) => `${d(i)}/restore` } },
  "/api/workspaces/[workspaceId]/designs/[designId]/fork": {
    POST: { viewer: 403, path: (i) => `${d(i)}/fork`, body: (i) => ({ targetWorkspaceId: i.ws, title: "Forked by a viewer" }) },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions": {
    GET: { viewer: 200, path: (i) => `${d(i)}/revisions` },
    POST: { viewer: 403, path: (i) => `${d(i)}/revisions`, body: (i) => ({ parentRevisionId: i.revision, circuit: demoCircuit(), message: "viewer" }) },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]": { GET: { viewer: 200, path: r } },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/restore": { POST: { viewer: 403, path: (i) => `${r(i)}/restore` } },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/export": { GET: { viewer: 200, path: (i) => `${r(i)}/export` } },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/report": { GET: { viewer: 200, path: (i) => `${r(i)}/report` } },
  "/api/workspaces/[workspaceId]/designs/[designId]/revisions/[revisionId]/report/attach": {
    POST: { viewer: 403, path: (i) => `${r(i)}/report/attach` },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/bench-links": {
    GET: { viewer: 403, path: (i) => `${d(i)}/bench-links` },
    POST: { viewer: 403, path: (i) => `${d(i)}/bench-links`, body: () => ({}) },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/bench-links/[linkId]": {
    DELETE: { viewer: 403, path: (i) => `${d(i)}/bench-links/${i.link}` },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/measurements": {
    GET: { viewer: 200, path: (i) => `${d(i)}/measurements` },
    POST: { viewer: 403, path: (i) => `${d(i)}/measurements` },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/measurements/[measurementId]": {
    // the unknown id answers 404 after the workspace check has let the viewer read
    GET: { viewer: 404, path: (i) => `${d(i)}/measurements/${i.unknown}` },
    DELETE: { viewer: 403, path: (i) => `${d(i)}/measurements/${i.unknown}` },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/attachments": {
    GET: { viewer: 200, path: (i) => `${d(i)}/attachments` },
    POST: { viewer: 403, path: (i) => `${d(i)}/attachments` },
  },
  "/api/workspaces/[workspaceId]/designs/[designId]/attachments/[attachmentId]": {
    GET: { viewer: 404, path: (i) => `${d(i)}/attachments/${i.unknown}` },
    // anyone who reads may delete what they uploaded, so the unknown id answers 404 before the uploader check
    DELETE: { viewer: 404, path: (i) => `${d(i)}/attachments/${i.unknown}` },
  },
  "/api/designs/[designId]/reviews": {
    GET: { viewer: 200, path: (i) => `/api/designs/${i.design}/reviews` },
    POST: { viewer: 403, path: (i) => `/api/designs/${i.design}/reviews`, body: (i) => ({ revisionId: i.revision, reviewerIds: [i.owner] }) },
  },
  "/api/designs/[designId]/revisions/[revisionId]/checks": {
    GET: { viewer: 200, path: (i) => `/api/designs/${i.design}/revisions/${i.revision}/checks` },
    POST: { viewer: 403, path: (i) => `/api/designs/${i.design}/revisions/${i.revision}/checks` },
  },
  "/api/reviews/[reviewId]": { GET: { viewer: 200, path: (i) => `/api/reviews/${i.review}` } },
  "/api/reviews/[reviewId]/remarks": {
    POST: { viewer: 403, path: (i) => `/api/reviews/${i.review}/remarks`, body: () => ({ body: "A viewer's remark", anchor: { type: "part", part: "J1" } }) },
  },
  "/api/reviews/[reviewId]/decisions": {
    POST: { viewer: 403, path: (i) => `/api/reviews/${i.review}/decisions`, body: () => ({ verdict: "approve", reason: "Looks fine to me." }) },
  },
  "/api/remarks/[remarkId]": { PATCH: { viewer: 403, path: (i) => `/api/remarks/${i.remark}`, body: () => ({ resolved: true }) } },
};

const isPublic = (rule: Rule): rule is PublicRule => "public" in rule;

function call(session: HttpSession | null, method: Method, rule: Rule, ids: Ids): Promise<Response> {
  const init = { method, body: rule.raw ?? (rule.body ? rule.body(ids) : undefined), headers: rule.raw ? { "content-type": "application/json" } : undefined };
  if (session) return session.fetch(rule.path(ids), init);
  return fetch(`${baseUrl}${rule.path(ids)}`, {
    method,
    headers: { ...originHeader(baseUrl), ...(init.body === undefined ? {} : { "content-type": "application/json" }) },
    body: init.body === undefined ? undefined : typeof init.body === "string" ? init.body : JSON.stringify(init.body),
    redirect: "manual",
  });
}

let ids: Ids;
let viewer: HttpSession;
let outsider: HttpSession;

beforeAll(async () => {
  const as = await signInAll(baseUrl);
  viewer = as.viewer;
  const ws = await workspaceIdOf(pool, DEMO_WORKSPACE.slug);
  const { rows: people } = await pool.query("SELECT id, email FROM users WHERE email = ANY($1)", [["orla@larkfield.example", "margit@larkfield.example"]]);
  const idOf = (email: string) => people.find((p) => p.email === email).id as string;
  const created = await as.designer.fetch(`/api/workspaces/${ws}/designs`, { method: "POST", body: { title: "Access matrix", circuit: demoCircuit() } });
  expect(created.status).toBe(201);
  const { design, revisionId } = await created.json();
  const link = await as.designer.fetch(`/api/workspaces/${ws}/designs/${design.id}/bench-links`, { method: "POST", body: {} });
  expect(link.status).toBe(201);
  const review = await as.designer.fetch(`/api/designs/${design.id}/reviews`, {
    method: "POST",
    body: { revisionId, reviewerIds: [idOf("margit@larkfield.example")], message: "For the access matrix." },
  });
  expect(review.status, await review.clone().text()).toBe(201);
  const reviewId = (await review.json()).review.id;
  const remark = await as.reviewer.fetch(`/api/reviews/${reviewId}/remarks`, { method: "POST", body: { body: "Check J1.", anchor: { type: "part", part: "J1" } } });
  expect(remark.status).toBe(201);
  ids = {
    ws,
    design: design.id,
    revision: revisionId,
    review: reviewId,
    remark: (await remark.json()).remark.id,
    link: (await link.json()).link.id,
    owner: idOf("orla@larkfield.example"),
    unknown: crypto.randomUUID(),
  };
  // A member of another workspace: signs up and makes a workspace of their own.
  const stranger = await signUp(baseUrl, "elsewhere");
  expect((await stranger.session.fetch("/api/workspaces", { method: "POST", body: { name: "Elsewhere Acoustics" } })).status).toBe(201);
  outsider = stranger.session;
}, 240_000);

describe("access rules of every route", () => {
  it("lists every route and method on disk in the table, and nothing that is not there", () => {
    const onDisk = routesOnDisk();
    const missing: string[] = [];
    for (const [route, methods] of onDisk) {
      for (const method of methods) if (!ACCESS[route]?.[method]) missing.push(`${method} ${route}`);
    }
    const stale = Object.entries(ACCESS).flatMap(([route, rules]) =>
      Object.keys(rules).filter((m) => !onDisk.get(route)?.includes(m as Method)).map((m) => `${m} ${route}`),
    );
    expect(missing, "routes without an access rule: add each to ACCESS").toEqual([]);
    expect(stale, "rules for routes that no longer exist").toEqual([]);
    expect(onDisk.size).toBeGreaterThan(30);
  });

  it("answers each call as its rule says: signed out, another workspace's member, the viewer", async () => {
    const wrong: string[] = [];
    const expectStatus = (label: string, response: Response, expected: number) => {
      if (response.status !== expected) wrong.push(`${label}: ${response.status}, expected ${expected}`);
    };
    for (const [route, rules] of Object.entries(ACCESS)) {
      for (const [method, rule] of Object.entries(rules) as [Method, Rule][]) {
        const label = `${method} ${route}`;
        if (isPublic(rule)) {
          expectStatus(`${label} signed out`, await call(null, method, rule, ids), rule.signedOut);
          continue;
        }
        expectStatus(`${label} signed out`, await call(null, method, rule, ids), 401);
        if (rule.foreign !== false) expectStatus(`${label} as another workspace's member`, await call(outsider, method, rule, ids), 404);
        expectStatus(`${label} as the viewer`, await call(viewer, method, rule, ids), rule.viewer);
      }
    }
    expect(wrong).toEqual([]);
    // Nothing the viewer or the outsider sent changed the design.
    const { rows } = await pool.query("SELECT title, deleted_at FROM designs WHERE id = $1", [ids.design]);
    expect(rows[0]).toMatchObject({ title: "Access matrix", deleted_at: null });
  }, 240_000);
});
