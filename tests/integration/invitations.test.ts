import { describe, expect, it } from "vitest";
import { sendMail } from "../../app/_server/mail";
import { invitationMail } from "../../app/_server/mail-templates/invitation";
import { listAudit } from "../../db/audit";
import {
  acceptInvitation,
  createInvitation,
  INVITATION_LIFETIME_MS,
  listOpenInvitations,
  previewInvitation,
  revokeInvitation,
} from "../../db/invitations";
import { getMembership } from "../../db/memberships";
import { makePerson, makeWorkspace } from "./accounts-fixtures";
import { linkIn, waitForMail } from "./captured-mail-helpers";

async function invite(workspaceId: string, actorId: string, email: string, role: "designer" | "viewer", now?: Date) {
  const invitation = await createInvitation({ workspaceId, actorId, email, role, now }, (token) =>
    sendMail({
      to: email,
      ...invitationMail({ url: `http://app.test/invitations/${token}`, workspaceName: "Test bench", inviterName: "Owner", role }),
    }),
  );
  const mail = await waitForMail(email);
  const token = linkIn(mail.text, "/invitations/").split("/invitations/")[1];
  return { invitation, token, mail };
}

describe("invitations", () => {
  it("mails a link through the SMTP fake that a new person accepts with the invited role", async () => {
    const { workspace, people } = await makeWorkspace(["owner"]);
    const newcomer = await makePerson("newcomer");
    const { token, mail } = await invite(workspace.workspaceId, people.owner.id, newcomer.email, "designer");
    expect(mail.subject).toMatch(/invites you to Test bench/);
    expect(mail.html).toContain("/invitations/");
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const preview = await previewInvitation(token);
    expect(preview).toMatchObject({ email: newcomer.email, role: "designer", workspaceSlug: workspace.slug });
    const accepted = await acceptInvitation(token, newcomer);
    expect(accepted).toEqual({ slug: workspace.slug, role: "designer" });
    expect((await getMembership(workspace.workspaceId, newcomer.id))?.role).toBe("designer");
    expect(await listOpenInvitations(workspace.workspaceId)).toEqual([]);
    const actions = (await listAudit(workspace.workspaceId)).map((a) => a.action);
    expect(actions.slice(0, 2)).toEqual(["invitation.accept", "invitation.create"]);
    // A second click on the same link is refused and changes nothing.
    await expect(acceptInvitation(token, newcomer)).rejects.toMatchObject({ code: "gone", message: /accepted already/ });
  });

  it("keeps an existing member's role and refuses inviting a member", async () => {
    const { workspace, people } = await makeWorkspace(["owner", "designer"]);
    await expect(invite(workspace.workspaceId, people.owner.id, people.designer.email, "viewer")).rejects.toMatchObject({
      code: "conflict",
    });
    // Someone already in another workspace (an existing person) joins this one.
    const other = await makeWorkspace(["owner"]);
    const { token } = await invite(workspace.workspaceId, people.owner.id, other.people.owner.email, "viewer");
    expect(await acceptInvitation(token, other.people.owner)).toMatchObject({ role: "viewer" });
    expect((await getMembership(other.workspace.workspaceId, other.people.owner.id))?.role).toBe("owner");
  });

  it("refuses an expired, a revoked, an unknown token and the wrong person", async () => {
    const { workspace, people } = await makeWorkspace(["owner"]);
    const late = await makePerson("late");
    const eightDaysAgo = new Date(Date.now() - INVITATION_LIFETIME_MS - 24 * 3600_000);
    const expired = await invite(workspace.workspaceId, people.owner.id, late.email, "viewer", eightDaysAgo);
    await expect(previewInvitation(expired.token)).rejects.toMatchObject({ code: "gone", message: /expired/ });
    await expect(acceptInvitation(expired.token, late)).rejects.toMatchObject({ code: "gone" });

    const withdrawn = await makePerson("withdrawn");
    const revoked = await invite(workspace.workspaceId, people.owner.id, withdrawn.email, "viewer");
    await revokeInvitation(workspace.workspaceId, people.owner.id, revoked.invitation.id);
    await expect(acceptInvitation(revoked.token, withdrawn)).rejects.toMatchObject({ code: "gone", message: /withdrawn/ });
    await expect(revokeInvitation(workspace.workspaceId, people.owner.id, revoked.invitation.id)).rejects.toMatchObject({
      code: "conflict",
    });
    expect(await getMembership(workspace.workspaceId, withdrawn.id)).toBeNull();

    await expect(previewInvitation("A".repeat(43))).rejects.toMatchObject({ code: "not_found" });
    const intended = await makePerson("intended");
    const wrongPerson = await makePerson("wrong");
    const { token } = await invite(workspace.workspaceId, people.owner.id, intended.email, "viewer");
    await expect(acceptInvitation(token, wrongPerson)).rejects.toMatchObject({ code: "forbidden", message: new RegExp(intended.email) });
    expect((await listAudit(workspace.workspaceId)).map((a) => a.action)).toContain("invitation.revoke");
  });

  it("an invitation of another workspace cannot be revoked through this one", async () => {
    const a = await makeWorkspace(["owner"]);
    const b = await makeWorkspace(["owner"]);
    const person = await makePerson("between");
    const { invitation } = await invite(a.workspace.workspaceId, a.people.owner.id, person.email, "viewer");
    await expect(revokeInvitation(b.workspace.workspaceId, b.people.owner.id, invitation.id)).rejects.toMatchObject({
      code: "not_found",
    });
  });

  it("keeps no invitation when the mail cannot be sent", async () => {
    const { workspace, people } = await makeWorkspace(["owner"]);
    await expect(
      createInvitation({ workspaceId: workspace.workspaceId, actorId: people.owner.id, email: "nobody@test.example", role: "viewer" }, async () => {
        throw new Error("mail server down");
      }),
    ).rejects.toThrow("mail server down");
    expect(await listOpenInvitations(workspace.workspaceId)).toEqual([]);
  });
});
