import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { getDb } from "./client";
import { memberships, workspaces } from "./schema";

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
