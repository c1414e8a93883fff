import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_WORKSPACE } from "../../db/demo-people";
import electretJfet from "../../sim/examples/electret-jfet.json";
import triodeFollower from "../../sim/examples/triode-emitter-follower.json";
import { type DemoRole, demoCircuit, foreignWorkspace, Pool, signInAll, withParameter, workspaceIdOf } from "./design-fixtures";
import { type HttpSession, originHeader } from "./http-session";

const baseUrl = inject("baseUrl");
const pool = new Pool({ connectionString: inject("databaseUrl") });
afterAll(() => pool.end());

let as: Record<DemoRole, HttpSession>;
let ws: string;
let foreign: Awaited<ReturnType<typeof foreignWorkspace>>;
const anonymous: HttpSession = {
  cookie: "",
  fetch: (path, init = {}) =>
    fetch(`${baseUrl}${path}`, {
      method: init.method ?? "GET",
      headers: { ...originHeader(baseUrl), ...(init.body === undefined ? {} : { "content-type": "application/json" }) },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      redirect: "manual",
    }),
};

beforeAll(async () => {
  as = await signInAll(baseUrl);
  ws = await workspaceIdOf(pool, DEMO_WORKSPACE.slug);
  foreign = await foreignWorkspace(pool);
});

interface Fixture {
  workspaceId: string;
  designId: string;
  revisionId: string;
  linkId: string;
}

/** A fresh design with one bench link, made by the demo owner, so each call of the matrix starts clean. */
async function fresh(): Promise<Fixture> {
  const created = await as.owner.fetch(`/api/workspaces/${ws}/designs`, { method: "POST", body: { title: "Matrix design", circuit: demoCircuit() } });
  expect(created.status).toBe(201);
  const { design, revisionId } = await created.json();
  const link = await as.owner.fetch(`/api/workspaces/${ws}/designs/${design.id}/bench-links`, { method: "POST", body: {} });
  expect(link.status).toBe(201);
  return { workspaceId: ws, designId: design.id, revisionId, linkId: (await link.json()).link.id };
}

type Call = (s: HttpSession, f: Fixture) => Promise<Response>;
const d = (f: Fixture) => `/api/workspaces/${f.workspaceId}/designs/${f.designId}`;
const EDITORS: DemoRole[] = ["owner", "designer"];
const EVERYONE: DemoRole[] = ["owner", "designer", "reviewer", "viewer"];

const ROUTES: { name: string; allowed: DemoRole[]; ok: number; call: Call; deleted?: boolean }[] = [
  { name: "GET designs", allowed: EVERYONE, ok: 200, call: (s, f) => s.fetch(`/api/workspaces/${f.workspaceId}/designs`) },
  { name: "POST designs", allowed: EDITORS, ok: 201, call: (s, f) => s.fetch(`/api/workspaces/${f.workspaceId}/designs`, { method: "POST", body: { title: "New" } }) },
  {
    name: "POST designs/import",
    allowed: EDITORS,
    ok: 201,
    call: (s, f) => s.fetch(`/api/workspaces/${f.workspaceId}/designs/import?title=Imported`, { method: "POST", body: demoCircuit() }),
  },
  { name: "GET design", allowed: EVERYONE, ok: 200, call: (s, f) => s.fetch(d(f)) },
  { name: "PATCH design", allowed: EDITORS, ok: 200, call: (s, f) => s.fetch(d(f), { method: "PATCH", body: { title: "Renamed" } }) },
  { name: "DELETE design", allowed: EDITORS, ok: 200, call: (s, f) => s.fetch(d(f), { method: "DELETE" }) },
  { name: "POST design/restore", allowed: EDITORS, ok: 200, deleted: true, call: (s, f) => s.fetch(`${d(f)}/restore`, { method: "POST" }) },
  { name: "POST design/fork", allowed: EDITORS, ok: 201, call: (s, f) => s.fetch(`${d(f)}/fork`, { method: "POST", body: { targetWorkspaceId: f.workspaceId } }) },
  { name: "GET revisions", allowed: EVERYONE, ok: 200, call: (s, f) => s.fetch(`${d(f)}/revisions`) },
  {
    name: "POST revisions",
    allowed: EDITORS,
    ok: 201,
    call: (s, f) => s.fetch(`${d(f)}/revisions`, { method: "POST", body: { parentRevisionId: f.revisionId, circuit: withParameter("RS", "3k3"), message: "m" } }),
  },
  { name: "GET revision", allowed: EVERYONE, ok: 200, call: (s, f) => s.fetch(`${d(f)}/revisions/${f.revisionId}`) },
  {
    name: "POST revision/restore",
    allowed: EDITORS,
    ok: 201,
    call: (s, f) => s.fetch(`${d(f)}/revisions/${f.revisionId}/restore`, { method: "POST", body: { parentRevisionId: f.revisionId } }),
  },
  { name: "GET revision/export", allowed: EVERYONE, ok: 200, call: (s, f) => s.fetch(`${d(f)}/revisions/${f.revisionId}/export`) },
  { name: "GET bench-links", allowed: EDITORS, ok: 200, call: (s, f) => s.fetch(`${d(f)}/bench-links`) },
  { name: "POST bench-links", allowed: EDITORS, ok: 201, call: (s, f) => s.fetch(`${d(f)}/bench-links`, { method: "POST", body: { isPublic: true } }) },
  { name: "DELETE bench-link", allowed: EDITORS, ok: 200, call: (s, f) => s.fetch(`${d(f)}/bench-links/${f.linkId}`, { method: "DELETE" }) },
];

describe("designs API: role × route matrix", () => {
  for (const routeCase of ROUTES) {
    it(`${routeCase.name}: allowed for ${routeCase.allowed.join(", ")}; 403 for the others, 401 signed out, 404 for another workspace`, async () => {
      for (const role of EVERYONE) {
        const f = await fresh();
        if (routeCase.deleted) expect((await as.owner.fetch(d(f), { method: "DELETE" })).status).toBe(200);
        const response = await routeCase.call(as[role], f);
        const expected = routeCase.allowed.includes(role) ? routeCase.ok : 403;
        expect(response.status, `${role} → ${routeCase.name}: ${await response.clone().text()}`).toBe(expected);
        if (expected === 403) expect((await response.json()).error).toMatchObject({ code: "forbidden", message: expect.stringMatching(/role/) });
      }
      const f = await fresh();
      expect((await routeCase.call(anonymous, f)).status).toBe(401);
      // Another workspace's ids, under that workspace's path (not a member) and under the demo workspace's path.
      const other: Fixture = { ...foreign, linkId: f.linkId };
      for (const role of EVERYONE) {
        expect((await routeCase.call(as[role], other)).status, `${role} → other workspace`).toBe(404);
      }
      if (!routeCase.name.startsWith("GET designs") && !routeCase.name.startsWith("POST designs")) {
        expect((await routeCase.call(as.owner, { ...other, workspaceId: ws })).status, "foreign design under own workspace").toBe(404);
      }
    });
  }
});

describe("designs API: bad input changes nothing", () => {
  it("a stale save is 409 with who and when; the draft is not stored and the head stays", async () => {
    const f = await fresh();
    const first = await as.designer.fetch(`${d(f)}/revisions`, { method: "POST", body: { parentRevisionId: f.revisionId, circuit: withParameter("RS", "3k3"), message: "Tomas first" } });
    expect(first.status).toBe(201);
    const { revision } = await first.json();
    const late = await as.owner.fetch(`${d(f)}/revisions`, { method: "POST", body: { parentRevisionId: f.revisionId, circuit: withParameter("RS", "6k8"), message: "late" } });
    expect(late.status).toBe(409);
    const { error } = await late.json();
    expect(error.detail).toMatchObject({ headRevisionId: revision.id, headNumber: 2, authorName: "Tomas Reyne" });
    expect(error.message).toMatch(/not saved/);
    const list = await (await as.owner.fetch(`${d(f)}/revisions`)).json();
    expect(list.revisions.map((r: { message: string }) => r.message)).toEqual(["Tomas first", "Imported circuit file"]);
  });

  it("a malformed circuit is 422 naming the part; malformed JSON 400; over 1 MB 413; unknown ids 404", async () => {
    const f = await fresh();
    const bad = demoCircuit() as { parts: { id: string; kind: string }[] };
    bad.parts.find((p) => p.id === "J1")!.kind = "jfett";
    const refused = await as.designer.fetch(`${d(f)}/revisions`, { method: "POST", body: { parentRevisionId: f.revisionId, circuit: bad, message: "typo" } });
    expect(refused.status).toBe(422);
    const body = await refused.json();
    expect(body.error.message).toMatch(/J1/);
    expect(body.error.detail).toMatchObject({ part: "J1" });
    const notJson = await as.designer.fetch(`/api/workspaces/${ws}/designs/import`, { method: "POST", body: "{ not json" as unknown as object });
    expect(notJson.status).toBe(400);
    const huge = await as.designer.fetch(`/api/workspaces/${ws}/designs/import`, { method: "POST", body: { ...demoCircuit(), notes: "x".repeat(1_100_000) } });
    expect(huge.status).toBe(413);
    expect((await as.designer.fetch(`/api/workspaces/${ws}/designs/00000000-0000-4000-8000-000000000000`)).status).toBe(404);
    expect((await as.designer.fetch(`/api/workspaces/${ws}/designs/nonsense`)).status).toBe(404);
    expect((await as.designer.fetch(`/api/workspaces/nonsense/designs`)).status).toBe(404);
    const revisions = await (await as.owner.fetch(`${d(f)}/revisions`)).json();
    expect(revisions.revisions).toHaveLength(1);
  });

  it("export is the revision's circuit as an attachment named <title>-r<n>.json", async () => {
    const f = await fresh();
    const response = await as.viewer.fetch(`${d(f)}/revisions/${f.revisionId}/export`);
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="Matrix design-r1\.json"/);
    expect(await response.json()).toEqual(demoCircuit());
  });

  it("lists with search, status filter, sort and pages over HTTP", async () => {
    const list = await (await as.viewer.fetch(`/api/workspaces/${ws}/designs?q=LA-47&pageSize=5`)).json();
    expect(list.rows.map((r: { title: string }) => r.title)).toEqual(["LA-47 studio condenser"]);
    const approved = await (await as.viewer.fetch(`/api/workspaces/${ws}/designs?status=approved`)).json();
    // The seeded approved design is there, and only approved ones (other browser tests may approve their own).
    expect(approved.rows.map((r: { title: string }) => r.title)).toContain("EC-6 electret plug-in");
    expect(new Set(approved.rows.map((r: { status: string }) => r.status))).toEqual(new Set(["approved"]));
    const deleted = await (await as.viewer.fetch(`/api/workspaces/${ws}/designs?show=deleted`)).json();
    expect(deleted.rows.map((r: { title: string }) => r.title)).toContain("Bench RC check (retired)");
    const badSort = await as.viewer.fetch(`/api/workspaces/${ws}/designs?sort=colour`);
    expect(badSort.status).toBe(422);
    expect((await badSort.json()).error.message).toMatch(/sort must be one of/);
  });
});

describe("bench links over HTTP", () => {
  it("a public link opens without signing in and counts the opening; revoked and expired links are 410", async () => {
    const f = await fresh();
    const made = await as.designer.fetch(`${d(f)}/bench-links`, { method: "POST", body: { isPublic: true, view: { plot: "response", variant: "pad" } } });
    const { token, path, link } = await made.json();
    expect(path).toBe(`/b/${token}`);
    const api = await anonymous.fetch(`/api/bench-links/${token}`);
    expect(api.status).toBe(200);
    expect((await api.json()).view).toMatchObject({ variant: "pad" });
    const page = await anonymous.fetch(path);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Matrix design");
    const links = await (await as.designer.fetch(`${d(f)}/bench-links`)).json();
    expect(links.links.find((l: { id: string }) => l.id === link.id).accessCount).toBe(2);

    expect((await as.designer.fetch(`${d(f)}/bench-links/${link.id}`, { method: "DELETE" })).status).toBe(200);
    const revoked = await fetch(`${baseUrl}${path}`);
    expect(revoked.status).toBe(410);
    expect(await revoked.text()).toContain("revoked");
    expect((await anonymous.fetch(`/api/bench-links/${token}`)).status).toBe(410);

    const expiring = await (await as.designer.fetch(`${d(f)}/bench-links`, { method: "POST", body: { isPublic: true, expiresAt: new Date(Date.now() + 3_600_000).toISOString() } })).json();
    await pool.query("UPDATE share_links SET expires_at = now() - interval '1 minute' WHERE id = $1", [expiring.link.id]);
    const expired = await fetch(`${baseUrl}${expiring.path}`);
    expect(expired.status).toBe(410);
    expect(await expired.text()).toContain("expired");
    const past = await as.designer.fetch(`${d(f)}/bench-links`, { method: "POST", body: { expiresAt: "2020-01-01T00:00:00Z" } });
    expect(past.status).toBe(422);
    expect((await fetch(`${baseUrl}/b/${"A".repeat(43)}`)).status).toBe(404);
  });

  it("shows the bench's caution on a link to a circuit with a valve or polarisation supply, and none on a low-voltage one", async () => {
    // The banner's text between its opening tag and the next block; empty when the page has none.
    const caution = (html: string) => {
      const at = html.indexOf('data-testid="caution-banner"');
      return at < 0 ? "" : html.slice(at, html.indexOf("</div>", at)).replace(/<[^>]+>/g, "").replace(/&#x27;|&#39;/g, "'");
    };
    const pageOf = async (title: string, circuit: unknown) => {
      const created = await as.owner.fetch(`/api/workspaces/${ws}/designs`, { method: "POST", body: { title, circuit } });
      expect(created.status, await created.clone().text()).toBe(201);
      const { design } = await created.json();
      const made = await as.owner.fetch(`/api/workspaces/${ws}/designs/${design.id}/bench-links`, { method: "POST", body: { isPublic: true } });
      const page = await anonymous.fetch((await made.json()).path);
      expect(page.status).toBe(200);
      return page.text();
    };
    // The circuits' own values: the follower's VHT is a 150 V valve supply to triode V1; the demo microphone's VPOL1
    // polarises the capsule at 60 V; the electret's largest source is a few volts. The thresholds are the bench's
    // (60 V DC extra-low-voltage limit, IEC 61140 band I from memory; supplies from 48 V, phantom power IEC 61938).
    const valve = caution(await pageOf("Link caution: valve", triodeFollower));
    expect(valve).toMatch(/Caution — lethal voltages\./);
    expect(valve).toMatch(/V1 is a valve: its supply is lethal/);
    expect(valve).toMatch(/VHT supplies 150 V/);
    const polarised = caution(await pageOf("Link caution: polarisation", demoCircuit()));
    expect(polarised).toMatch(/VPOL1 supplies 60 V/);
    const electretPage = await pageOf("Link caution: electret", electretJfet);
    expect(electretPage).toContain("Link caution: electret");
    expect(caution(electretPage)).toBe("");
  });

  it("a members-only link sends a signed-out person to sign in, and opens for a member", async () => {
    const f = await fresh();
    const { path } = await (await as.owner.fetch(`${d(f)}/bench-links`, { method: "POST", body: { isPublic: false } })).json();
    const signedOut = await anonymous.fetch(path);
    expect(signedOut.status).toBe(307);
    expect(signedOut.headers.get("location")).toMatch(/\/sign-in\?callbackUrl=/);
    const member = await as.viewer.fetch(path);
    expect(member.status).toBe(200);
  });
});
