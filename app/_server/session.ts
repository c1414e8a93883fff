import "server-only";
import { cache } from "react";
import { type Action, can } from "@/components/auth/roles";
import { AppError } from "@/db/errors";
import { getUserWithMembership, type WorkspaceMembership } from "@/db/memberships";
import { getUserById, type UserRow } from "@/db/users";
import { requestSessionToken } from "./session-cookie";

export type SessionUser = Pick<UserRow, "id" | "email" | "name">;

/**
 * The signed-in person, or null. Reads the signed session cookie, then the user row (so a deleted user is out);
 * once per request, however many server components and checks ask.
 */
export const getSessionUser = cache(async (): Promise<SessionUser | null> => {
  const id = (await requestSessionToken())?.sub;
  if (!id) return null;
  const user = await getUserById(id);
  return user ? { id: user.id, email: user.email, name: user.name } : null;
});

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
  const id = (await requestSessionToken())?.sub;
  const found = id ? await getUserWithMembership(id, { id: workspaceId }) : null;
  if (!found) throw new AppError("unauthenticated", "Sign in to continue.");
  const { user, membership } = found;
  if (!membership) throw new AppError("not_found", "No such workspace, or you are not a member of it.");
  if (!can(membership.role, action)) {
    throw new AppError("forbidden", `Your role (${membership.role}) does not allow this (${action}). Ask an owner.`);
  }
  return { user, membership };
}
