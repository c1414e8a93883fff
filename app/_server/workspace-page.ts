import "server-only";
import { notFound, redirect } from "next/navigation";
import { type Action, can } from "@/components/auth/roles";
import { getMembershipBySlug, type WorkspaceMembership } from "@/db/memberships";
import { getSessionUser, type SessionUser } from "./session";

/**
 * For a workspace page: the signed-in person (else to sign-in and back) and their membership by slug (a workspace
 * they are not in, or a page their role does not open, is a 404 like any unknown address).
 */
export async function requireWorkspacePage(
  slug: string,
  path: string,
  action?: Action,
): Promise<{ user: SessionUser; membership: WorkspaceMembership }> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  const membership = await getMembershipBySlug(slug, user.id);
  if (!membership || (action && !can(membership.role, action))) notFound();
  return { user, membership };
}

/** For pages only signed-in people see. */
export async function requireSignedInPage(path: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  return user;
}
