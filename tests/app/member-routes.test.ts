import { beforeAll, describe, expect, inject, it } from "vitest";
import { inviteAndAccept, signUp, type TestPerson } from "./people";

const baseUrl = inject("baseUrl");

type RoleName = "owner" | "designer" | "reviewer" | "viewer";
const ROLES: RoleName[] = ["owner", "designer", "reviewer", "viewer"];

/**
 * The role × route matrix for the workspace, member, invitation and audit routes. Each call is made by each role in
 * a fresh workspace; refused calls answer 403 and change nothing; another workspace's id answers 404 for everyone.
 */
describe("role × route matrix", () => {
  const people = {} as Record<RoleName, TestPerson>;
  let workspaceId = "";
  let otherWorkspaceId = "";
  let spare: TestPerson;

  beforeAll(async () => {
    for (const role of ROLES) people[role] = await signUp(baseUrl, role);
    const created = await people.owner.session.fetch("/api/workspaces", { method: "POST", body: { name: "Matrix Bench" } });
    expect(created.status).toBe(201);
    workspaceId = (await created.json()).workspace.workspaceId;
    for (const role of ROLES.slice(1)) await inviteAndAccept(baseUrl, people.owner, workspaceId, people[role], role);
    spare = await signUp(baseUrl, "spare");
    await inviteAndAccept(baseUrl, people.owner, workspaceId, spare, "viewer");
    const stranger = await signUp(baseUrl, "stranger");
    const other = await stranger.session.fetch("/api/workspaces", { method: "POST", body: { name: "Elsewhere Bench" } });
    otherWorkspaceId = (await other.json()).workspace.workspaceId;
  }, 120_000);

  const members = async () =>
    (await (await people.owner.session.fetch(`/api/workspaces/${workspaceId}/members`)).json()).members as { userId: string; role: string }[];

  it("members: everyone reads, only owners change roles and remove", async () => {
    for (const role of ROLES) {
      const list = await people[role].session.fetch(`/api/workspaces/${workspaceId}/members`);
      expect(list.status, role).toBe(200);
      expect((await list.json()).members).toHaveLength(5);
    }
    const before = await members();
    for (const role of ROLES.slice(1)) {
      const change = await people[role].session.fetch(`/api/workspaces/${workspaceId}/members`, {
        method: "PATCH",
        body: { userId: spare.id, role: "designer" },
      });
      expect(change.status, role).toBe(403);
      expect((await change.json()).error.code).toBe("forbidden");
      const remove = await people[role].session.fetch(`/api/workspaces/${workspaceId}/members`, { method: "DELETE", body: { userId: spare.id } });
      expect(remove.status, role).toBe(403);
    }
    expect(await members()).toEqual(before);
    const change = await people.owner.session.fetch(`/api/workspaces/${workspaceId}/members`, {
      method: "PATCH",
      body: { userId: spare.id, role: "reviewer" },
    });
    expect(change.status).toBe(200);
    expect((await members()).find((m) => m.userId === spare.id)?.role).toBe("reviewer");
  });

  it("invitations and settings and the audit log: owners only", async () => {
    for (const role of ROLES.slice(1)) {
      const s = people[role].session;
      expect((await s.fetch(`/api/workspaces/${workspaceId}/invitations`)).status, role).toBe(403);
      expect(
        (await s.fetch(`/api/workspaces/${workspaceId}/invitations`, { method: "POST", body: { email: "x@people.example", role: "viewer" } })).status,
        role,
      ).toBe(403);
      expect(
        (await s.fetch(`/api/workspaces/${workspaceId}/invitations`, { method: "DELETE", body: { invitationId: crypto.randomUUID() } })).status,
        role,
      ).toBe(403);
      expect((await s.fetch(`/api/workspaces/${workspaceId}`, { method: "PATCH", body: { name: "Renamed" } })).status, role).toBe(403);
      expect((await s.fetch(`/api/workspaces/${workspaceId}`, { method: "DELETE" })).status, role).toBe(403);
      expect((await s.fetch(`/api/workspaces/${workspaceId}/audit`)).status, role).toBe(403);
    }
    const owner = people.owner.session;
    const invited = await owner.fetch(`/api/workspaces/${workspaceId}/invitations`, { method: "POST", body: { email: "later@people.example", role: "viewer" } });
    expect(invited.status).toBe(201);
    const { invitation } = await invited.json();
    const open = await (await owner.fetch(`/api/workspaces/${workspaceId}/invitations`)).json();
    expect(open.invitations.map((i: { email: string }) => i.email)).toEqual(["later@people.example"]);
    expect((await owner.fetch(`/api/workspaces/${workspaceId}/invitations`, { method: "DELETE", body: { invitationId: invitation.id } })).status).toBe(204);
    const renamed = await owner.fetch(`/api/workspaces/${workspaceId}`, { method: "PATCH", body: { name: "Matrix Bench Two", allowSelfApproval: true } });
    expect(renamed.status).toBe(200);
    expect((await renamed.json()).workspace).toMatchObject({ name: "Matrix Bench Two", allowSelfApproval: true });
    const audit = await (await owner.fetch(`/api/workspaces/${workspaceId}/audit`)).json();
    const actions = audit.entries.map((e: { action: string }) => e.action);
    for (const action of ["workspace.create", "invitation.create", "invitation.accept", "member.role", "invitation.revoke", "workspace.settings"]) {
      expect(actions).toContain(action);
    }
    // The settings entry says what changed from what.
    expect(audit.entries[0]).toMatchObject({ action: "workspace.settings", detail: { name: { from: "Matrix Bench", to: "Matrix Bench Two" } } });
  });

  it("another workspace's id, a malformed id and no session", async () => {
    for (const role of ROLES) {
      const s = people[role].session;
      for (const path of ["members", "invitations", "audit"]) {
        const response = await s.fetch(`/api/workspaces/${otherWorkspaceId}/${path}`);
        expect(response.status, `${role} ${path}`).toBe(404);
        expect((await response.json()).error.message).toMatch(/No such workspace/);
      }
      expect((await s.fetch(`/api/workspaces/${otherWorkspaceId}`, { method: "PATCH", body: { name: "Taken over" } })).status).toBe(404);
      expect((await s.fetch(`/api/workspaces/${otherWorkspaceId}`, { method: "DELETE" })).status).toBe(404);
      expect((await s.fetch("/api/workspaces/not-a-uuid/members")).status).toBe(404);
    }
    expect((await fetch(`${baseUrl}/api/workspaces/${workspaceId}/members`)).status).toBe(401);
  });

  it("bad input gets a field message and changes nothing", async () => {
    const owner = people.owner.session;
    const bad = await owner.fetch(`/api/workspaces/${workspaceId}/invitations`, { method: "POST", body: { email: "not-an-address", role: "chief" } });
    expect(bad.status).toBe(422);
    const body = await bad.json();
    expect(body.error.fields.email).toMatch(/e-mail address like/);
    expect(body.error.fields.role).toMatch(/Choose one of the roles/);
    const malformed = await owner.fetch(`/api/workspaces/${workspaceId}/members`, { method: "PATCH", body: "{not json" });
    expect(malformed.status).toBe(400);
    const unknown = await owner.fetch(`/api/workspaces/${workspaceId}/members`, { method: "PATCH", body: { userId: crypto.randomUUID(), role: "viewer" } });
    expect(unknown.status).toBe(404);
  });

  it("the last owner cannot be demoted, removed or leave; others may leave", async () => {
    const owner = people.owner.session;
    const demote = await owner.fetch(`/api/workspaces/${workspaceId}/members`, { method: "PATCH", body: { userId: people.owner.id, role: "viewer" } });
    expect(demote.status).toBe(409);
    expect((await demote.json()).error.message).toMatch(/at least one owner/);
    expect((await owner.fetch(`/api/workspaces/${workspaceId}/members`, { method: "DELETE", body: { userId: people.owner.id } })).status).toBe(409);
    const leave = await spare.session.fetch(`/api/workspaces/${workspaceId}/members`, { method: "DELETE", body: { userId: spare.id } });
    expect(leave.status).toBe(204);
    expect((await spare.session.fetch(`/api/workspaces/${workspaceId}/members`)).status).toBe(404);
    expect((await members()).find((m) => m.userId === people.owner.id)?.role).toBe("owner");
  });

  it("an owner deletes a workspace; its members then get 404", async () => {
    const owner = people.owner.session;
    const created = await owner.fetch("/api/workspaces", { method: "POST", body: { name: "Short-lived Bench" } });
    const { workspace } = await created.json();
    expect(workspace.slug).toMatch(/^short-lived-bench/);
    expect((await owner.fetch(`/api/workspaces/${workspace.workspaceId}`, { method: "DELETE" })).status).toBe(204);
    expect((await owner.fetch(`/api/workspaces/${workspace.workspaceId}/members`)).status).toBe(404);
  });
});
