import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { listAudit } from "../../db/audit";
import { getDb } from "../../db/client";
import { changeMemberRole, LAST_OWNER_MESSAGE, listMembers, removeMember } from "../../db/members";
import { getMembership, getMembershipBySlug, getUserWithMembership } from "../../db/memberships";
import { memberships, users } from "../../db/schema";
import { makePerson, makeWorkspace } from "./accounts-fixtures";

describe("memberships and the last-owner rule", () => {
  it("lists members owners first and records the creator as owner", async () => {
    const { workspace, people } = await makeWorkspace();
    const members = await listMembers(workspace.workspaceId);
    expect(members.map((m) => m.role)).toEqual(["owner", "designer", "reviewer", "viewer"]);
    expect(members[0].userId).toBe(people.owner.id);
    const audit = await listAudit(workspace.workspaceId);
    expect(audit.map((a) => a.action)).toEqual(["workspace.create"]);
  });

  it("changes a role with an audit entry naming old and new role", async () => {
    const { workspace, people } = await makeWorkspace();
    await changeMemberRole(workspace.workspaceId, people.owner.id, people.viewer.id, "reviewer");
    expect((await getMembership(workspace.workspaceId, people.viewer.id))?.role).toBe("reviewer");
    const [entry] = await listAudit(workspace.workspaceId, { limit: 1 });
    expect(entry).toMatchObject({ action: "member.role", targetId: people.viewer.id, actorEmail: people.owner.email });
    expect(entry.detail).toMatchObject({ from: "viewer", to: "reviewer" });
  });

  it("refuses to demote, remove or let leave the last owner, and changes nothing", async () => {
    const { workspace, people } = await makeWorkspace(["owner", "designer"]);
    const before = await listAudit(workspace.workspaceId);
    await expect(changeMemberRole(workspace.workspaceId, people.owner.id, people.owner.id, "designer")).rejects.toMatchObject({
      code: "conflict",
      message: LAST_OWNER_MESSAGE,
    });
    await expect(removeMember(workspace.workspaceId, people.owner.id, people.owner.id)).rejects.toMatchObject({ code: "conflict" });
    expect((await getMembership(workspace.workspaceId, people.owner.id))?.role).toBe("owner");
    expect(await listAudit(workspace.workspaceId)).toHaveLength(before.length);
  });

  it("lets an owner step down once a second owner exists, and a member leave", async () => {
    const { workspace, people } = await makeWorkspace(["owner", "designer", "viewer"]);
    await changeMemberRole(workspace.workspaceId, people.owner.id, people.designer.id, "owner");
    await changeMemberRole(workspace.workspaceId, people.designer.id, people.owner.id, "viewer");
    expect((await getMembership(workspace.workspaceId, people.owner.id))?.role).toBe("viewer");
    await removeMember(workspace.workspaceId, people.viewer.id, people.viewer.id);
    expect(await getMembership(workspace.workspaceId, people.viewer.id)).toBeNull();
    const [entry] = await listAudit(workspace.workspaceId, { limit: 1 });
    expect(entry.action).toBe("member.leave");
  });

  it("keeps one owner when two owners demote each other at the same time", async () => {
    const { workspace, people } = await makeWorkspace(["owner", "designer"]);
    await changeMemberRole(workspace.workspaceId, people.owner.id, people.designer.id, "owner");
    const results = await Promise.allSettled([
      changeMemberRole(workspace.workspaceId, people.owner.id, people.designer.id, "viewer"),
      changeMemberRole(workspace.workspaceId, people.designer.id, people.owner.id, "viewer"),
    ]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const owners = await getDb().select().from(memberships).where(eq(memberships.workspaceId, workspace.workspaceId));
    expect(owners.filter((m) => m.role === "owner")).toHaveLength(1);
  });

  it("reports an unknown member as not found", async () => {
    const { workspace, people } = await makeWorkspace(["owner"]);
    const stranger = await makePerson("stranger");
    await expect(changeMemberRole(workspace.workspaceId, people.owner.id, stranger.id, "viewer")).rejects.toMatchObject({
      code: "not_found",
    });
  });

  it("finds a person and their membership in one query, by workspace id or slug, as the two separate reads do", async () => {
    const { workspace, people } = await makeWorkspace(["owner", "reviewer"]);
    const { workspace: other } = await makeWorkspace(["owner"]);
    for (const by of [{ id: workspace.workspaceId }, { slug: workspace.slug }]) {
      const found = await getUserWithMembership(people.reviewer.id, by);
      expect(found?.user).toEqual({ id: people.reviewer.id, email: people.reviewer.email, name: people.reviewer.name });
      expect(found?.membership).toEqual(await getMembership(workspace.workspaceId, people.reviewer.id));
      expect(found?.membership).toEqual(await getMembershipBySlug(workspace.slug, people.reviewer.id));
      expect(found?.membership?.role).toBe("reviewer");
    }
    // someone else's workspace, and an unknown slug: the person, no membership
    for (const by of [{ id: other.workspaceId }, { slug: other.slug }, { slug: "no-such-workspace" }]) {
      const found = await getUserWithMembership(people.reviewer.id, by);
      expect(found?.user.id).toBe(people.reviewer.id);
      expect(found?.membership).toBeNull();
    }
    // a person deleted since their cookie was signed is nobody
    await getDb().delete(users).where(eq(users.id, people.reviewer.id));
    expect(await getUserWithMembership(people.reviewer.id, { slug: workspace.slug })).toBeNull();
  });
});
