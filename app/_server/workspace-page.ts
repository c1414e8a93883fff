import "server-only";
import { notFound, redirect } from "next/navigation";
import { type Action, can } from "@/components/auth/roles";
import { getUserWithMembership, type WorkspaceMembership } from "@/db/memberships";
import { getSessionUser, type SessionUser } from "./session";
import { requestSessionToken } from "./session-cookie";

/**
 * For a workspace page: the signed-in person (else to sign-in and back) and their membership by slug (a workspace
 * they are not in, or a page their role does not open, is a 404 like any unknown address).
 */
export async function requireWorkspacePage(
  slug: string,
  path: string,
  action?: Action,
): Promise<{ user: SessionUser; membership: WorkspaceMembership }> {
  // the person and the membership in one round trip
  const id = (await requestSessionToken())?.sub;
  const found = id ? await getUserWithMembership(id, { slug }) : null;
  if (!found) redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  const { user, membership } = found;
  if (!membership || (action && !can(membership.role, action))) notFound();
  return { user, membership };
}

/** For pages only signed-in people see. */
export async function requireSignedInPage(path: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  return user;
}
