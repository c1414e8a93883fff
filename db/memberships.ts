import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { getDb } from "./client";
import { memberships, users, workspaces } from "./schema";

export interface WorkspaceMembership {
  workspaceId: string;
  slug: string;
  name: string;
  role: Role;
  allowPublicLinks: boolean;
  allowSelfApproval: boolean;
}

const membershipColumns = {
  workspaceId: workspaces.id,
  slug: workspaces.slug,
  name: workspaces.name,
  role: memberships.role,
  allowPublicLinks: workspaces.allowPublicLinks,
  allowSelfApproval: workspaces.allowSelfApproval,
};

export async function getMembership(workspaceId: string, userId: string): Promise<WorkspaceMembership | null> {
  const rows = await getDb()
    .select(membershipColumns)
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)))
    .limit(1);
  return rows[0] ?? null;
}

/**
 * A person and their membership of one workspace, found by id or by slug, in one round trip (every API request and
 * workspace page asks both): null when the person no longer exists; `membership` null when they are not a member.
 */
export async function getUserWithMembership(
  userId: string,
  workspace: { id: string } | { slug: string },
): Promise<{ user: { id: string; email: string; name: string | null }; membership: WorkspaceMembership | null } | null> {
  const query = getDb()
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      workspaceId: workspaces.id,
      slug: workspaces.slug,
      workspaceName: workspaces.name,
      role: memberships.role,
      allowPublicLinks: workspaces.allowPublicLinks,
      allowSelfApproval: workspaces.allowSelfApproval,
    })
    .from(users);
  const joined =
    "id" in workspace
      ? query
          .leftJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.workspaceId, workspace.id)))
          .leftJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
      : query
          .leftJoin(workspaces, eq(workspaces.slug, workspace.slug))
          .leftJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.workspaceId, workspaces.id)));
  const rows = await joined.where(eq(users.id, userId)).limit(1);
  const row = rows[0];
  if (!row) return null;
  const { id, email, name, workspaceId, slug, workspaceName, role, allowPublicLinks, allowSelfApproval } = row;
  // a workspace without the person's membership (found by slug) is no membership
  const membership =
    workspaceId && slug && workspaceName && role && allowPublicLinks !== null && allowSelfApproval !== null
      ? { workspaceId, slug, name: workspaceName, role, allowPublicLinks, allowSelfApproval }
      : null;
  return { user: { id, email, name }, membership };
}

export async function getMembershipBySlug(slug: string, userId: string): Promise<WorkspaceMembership | null> {
  const rows = await getDb()
    .select(membershipColumns)
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(and(eq(workspaces.slug, slug), eq(memberships.userId, userId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function listMembershipsForUser(userId: string): Promise<WorkspaceMembership[]> {
  return getDb()
    .select(membershipColumns)
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(workspaces.name));
}
