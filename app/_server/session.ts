import "server-only";
import { getServerSession } from "next-auth";
import { type Action, can } from "@/components/auth/roles";
import { AppError } from "@/db/errors";
import { getMembership, type WorkspaceMembership } from "@/db/memberships";
import { getUserById, type UserRow } from "@/db/users";
import { requestAuthOptions } from "./auth-options";

export type SessionUser = Pick<UserRow, "id" | "email" | "name">;

/** The signed-in person, or null. Reads the signed session cookie, then the user row (so a deleted user is out). */
export async function getSessionUser(): Promise<SessionUser | null> {
  const session = await getServerSession(await requestAuthOptions());
  const id = (session?.user as { id?: string } | undefined)?.id;
  if (!id) return null;
  const user = await getUserById(id);
  return user ? { id: user.id, email: user.email, name: user.name } : null;
}

export async function requireUser(): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) throw new AppError("unauthenticated", "Sign in to continue.");
  return user;
}

/**
 * The caller's membership of a workspace, checked against an action. A workspace the caller does not belong to is
 * reported as not found, so ids of other workspaces reveal nothing.
 */
export async function requireAction(
  workspaceId: string,
  action: Action,
): Promise<{ user: SessionUser; membership: WorkspaceMembership }> {
  const user = await requireUser();
  const membership = await getMembership(workspaceId, user.id);
  if (!membership) throw new AppError("not_found", "No such workspace, or you are not a member of it.");
  if (!can(membership.role, action)) {
    throw new AppError("forbidden", `Your role (${membership.role}) does not allow this (${action}). Ask an owner.`);
  }
  return { user, membership };
}
