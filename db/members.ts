import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { recordAudit } from "./audit";
import { type Database, getDb } from "./client";
import { AppError } from "./errors";
import { memberships, users } from "./schema";

export interface Member {
  userId: string;
  name: string | null;
  email: string;
  role: Role;
  joinedAt: Date;
}

export async function listMembers(workspaceId: string): Promise<Member[]> {
  return getDb()
    .select({
      userId: memberships.userId,
      name: users.name,
      email: users.email,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(sql`case ${memberships.role} when 'owner' then 0 when 'designer' then 1 when 'reviewer' then 2 else 3 end`, asc(users.name));
}

export const LAST_OWNER_MESSAGE =
  "A workspace needs at least one owner. Make someone else an owner first, or delete the workspace in its settings.";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

/**
 * Locks the workspace's memberships (so two owners cannot demote each other at once and leave none) and returns the
 * target's row and the number of owners.
 */
async function lockForChange(tx: Tx, workspaceId: string, userId: string) {
  const rows = await tx
    .select({ userId: memberships.userId, role: memberships.role, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .for("update", { of: memberships });
  const target = rows.find((row) => row.userId === userId);
  if (!target) throw new AppError("not_found", "That person is not a member of this workspace.");
  const owners = rows.filter((row) => row.role === "owner").length;
  return { target, owners };
}

export async function changeMemberRole(workspaceId: string, actorId: string, userId: string, role: Role): Promise<void> {
  await getDb().transaction(async (tx) => {
    const { target, owners } = await lockForChange(tx, workspaceId, userId);
    if (target.role === role) return;
    if (target.role === "owner" && owners === 1) throw new AppError("conflict", LAST_OWNER_MESSAGE);
    await tx
      .update(memberships)
      .set({ role })
      .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "member.role",
      targetType: "user",
      targetId: userId,
      detail: { email: target.email, from: target.role, to: role },
    });
  });
}

/** Removes a member; when actor and member are the same person, they leave. */
export async function removeMember(workspaceId: string, actorId: string, userId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const { target, owners } = await lockForChange(tx, workspaceId, userId);
    if (target.role === "owner" && owners === 1) throw new AppError("conflict", LAST_OWNER_MESSAGE);
    await tx.delete(memberships).where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: actorId === userId ? "member.leave" : "member.remove",
      targetType: "user",
      targetId: userId,
      detail: { email: target.email, role: target.role },
    });
  });
}
