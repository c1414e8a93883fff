import "server-only";
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { AppError } from "./errors";
import { invitations, memberships, users, workspaces } from "./schema";
import { hashToken, newToken } from "./tokens";

/** How long an invitation link works (pinned: 7 days), ms. */
export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60_000;

export interface PendingInvitation {
  id: string;
  email: string;
  role: Role;
  invitedByName: string | null;
  createdAt: Date;
  expiresAt: Date;
}

/** Invitations neither accepted nor revoked, newest first; expired ones are listed (the page marks them). */
export async function listOpenInvitations(workspaceId: string): Promise<PendingInvitation[]> {
  return getDb()
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      invitedByName: users.name,
      createdAt: invitations.createdAt,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.workspaceId, workspaceId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
    .orderBy(desc(invitations.createdAt));
}

/**
 * Creates an invitation and hands its token to `deliver` (which mails it) inside the same transaction: if the mail
 * cannot be sent, no invitation is left behind. Inviting an address again replaces its open invitation.
 */
export async function createInvitation(
  input: { workspaceId: string; actorId: string; email: string; role: Role; now?: Date },
  deliver: (token: string) => Promise<void>,
): Promise<PendingInvitation> {
  const now = input.now ?? new Date();
  const email = input.email.toLowerCase();
  return getDb().transaction(async (tx) => {
    const member = await tx
      .select({ userId: memberships.userId })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.workspaceId, input.workspaceId), sql`lower(${users.email}) = ${email}`))
      .limit(1);
    if (member.length > 0) {
      throw new AppError("conflict", `${email} is already a member of this workspace. Change their role in the list instead.`, {
        fields: { email: "Already a member." },
      });
    }
    await tx
      .update(invitations)
      .set({ revokedAt: now })
      .where(
        and(
          eq(invitations.workspaceId, input.workspaceId),
          sql`lower(${invitations.email}) = ${email}`,
          isNull(invitations.acceptedAt),
          isNull(invitations.revokedAt),
        ),
      );
    const { token, hash } = newToken();
    const [row] = await tx
      .insert(invitations)
      .values({
        workspaceId: input.workspaceId,
        email,
        role: input.role,
        tokenHash: hash,
        invitedBy: input.actorId,
        expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_MS),
        createdAt: now,
      })
      .returning();
    await recordAudit(tx, {
      workspaceId: input.workspaceId,
      actorId: input.actorId,
      action: "invitation.create",
      targetType: "invitation",
      targetId: row.id,
      detail: { email, role: input.role },
    });
    await deliver(token);
    const [inviter] = await tx.select({ name: users.name }).from(users).where(eq(users.id, input.actorId));
    return {
      id: row.id,
      email: row.email,
      role: row.role,
      invitedByName: inviter?.name ?? null,
      createdAt: row.createdAt,
      expiresAt: row.expiresAt,
    };
  });
}

export async function revokeInvitation(workspaceId: string, actorId: string, invitationId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(invitations)
      .where(and(eq(invitations.id, invitationId), eq(invitations.workspaceId, workspaceId)))
      .for("update");
    if (!row) throw new AppError("not_found", "No such invitation in this workspace.");
    if (row.acceptedAt) throw new AppError("conflict", `${row.email} accepted this invitation already; remove the member instead.`);
    if (row.revokedAt) throw new AppError("conflict", "This invitation was revoked already.");
    await tx.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, invitationId));
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "invitation.revoke",
      targetType: "invitation",
      targetId: invitationId,
      detail: { email: row.email, role: row.role },
    });
  });
}

export interface InvitationPreview {
  workspaceName: string;
  workspaceSlug: string;
  email: string;
  role: Role;
  invitedByName: string | null;
  expiresAt: Date;
}

function refuseClosed(row: { acceptedAt: Date | null; revokedAt: Date | null; expiresAt: Date }) {
  if (row.acceptedAt) throw new AppError("gone", "This invitation was accepted already. Sign in to open the workspace.");
  if (row.revokedAt) throw new AppError("gone", "This invitation was withdrawn. Ask the workspace's owner for a new one.");
  if (row.expiresAt.getTime() < Date.now()) {
    throw new AppError("gone", "This invitation has expired (invitations work for 7 days). Ask the workspace's owner for a new one.");
  }
}

/** What the invitation page shows before accepting. Unknown tokens are 404; accepted, revoked or expired are 410. */
export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const [row] = await getDb()
    .select({
      workspaceName: workspaces.name,
      workspaceSlug: workspaces.slug,
      email: invitations.email,
      role: invitations.role,
      invitedByName: users.name,
      expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt,
      revokedAt: invitations.revokedAt,
    })
    .from(invitations)
    .innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) throw new AppError("not_found", "This invitation link is not valid. Check that the whole link was copied.");
  refuseClosed(row);
  const { acceptedAt: _a, revokedAt: _r, ...preview } = row;
  return preview;
}

/**
 * Accepts an invitation as the signed-in person, whose e-mail must be the invited one. Someone already in the
 * workspace keeps their role. Returns the workspace's slug.
 */
export async function acceptInvitation(token: string, user: { id: string; email: string }): Promise<{ slug: string; role: Role }> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx.select().from(invitations).where(eq(invitations.tokenHash, hashToken(token))).for("update");
    if (!row) throw new AppError("not_found", "This invitation link is not valid. Check that the whole link was copied.");
    refuseClosed(row);
    if (row.email.toLowerCase() !== user.email.toLowerCase()) {
      throw new AppError("forbidden", `This invitation is for ${row.email}. Sign out and sign in (or create an account) with that address.`);
    }
    const [workspace] = await tx.select({ slug: workspaces.slug }).from(workspaces).where(eq(workspaces.id, row.workspaceId));
    const inserted = await tx
      .insert(memberships)
      .values({ workspaceId: row.workspaceId, userId: user.id, role: row.role })
      .onConflictDoNothing()
      .returning({ role: memberships.role });
    await tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, row.id));
    const [current] = await tx
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.workspaceId, row.workspaceId), eq(memberships.userId, user.id)));
    await recordAudit(tx, {
      workspaceId: row.workspaceId,
      actorId: user.id,
      action: "invitation.accept",
      targetType: "invitation",
      targetId: row.id,
      detail: { email: row.email, role: current.role, joined: inserted.length > 0 },
    });
    return { slug: workspace.slug, role: current.role };
  });
}
