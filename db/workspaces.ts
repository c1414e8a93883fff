import "server-only";
import { eq, like, or } from "drizzle-orm";
import { slugFromName } from "@/components/schemas/slug";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { AppError } from "./errors";
import { getMembership, type WorkspaceMembership } from "./memberships";
import { memberships, workspaces } from "./schema";

/** A free slug: the name's slug, or with -2, -3 … when taken. */
async function freeSlug(tx: Pick<ReturnType<typeof getDb>, "select">, name: string): Promise<string> {
  const base = slugFromName(name);
  const taken = new Set(
    (
      await tx
        .select({ slug: workspaces.slug })
        .from(workspaces)
        .where(or(eq(workspaces.slug, base), like(workspaces.slug, `${base}-%`)))
    ).map((row) => row.slug),
  );
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) if (!taken.has(`${base}-${n}`)) return `${base}-${n}`;
}

/** Creates a workspace; the creator becomes its first owner. */
export async function createWorkspace(userId: string, name: string): Promise<WorkspaceMembership> {
  const id = await getDb().transaction(async (tx) => {
    const slug = await freeSlug(tx, name);
    const [row] = await tx.insert(workspaces).values({ slug, name }).returning({ id: workspaces.id });
    await tx.insert(memberships).values({ workspaceId: row.id, userId, role: "owner" });
    await recordAudit(tx, {
      workspaceId: row.id,
      actorId: userId,
      action: "workspace.create",
      targetType: "workspace",
      targetId: row.id,
      detail: { name, slug },
    });
    return row.id;
  });
  const membership = await getMembership(id, userId);
  if (!membership) throw new AppError("unavailable", "The workspace was created but could not be read back. Reload.");
  return membership;
}

export interface WorkspaceSettingsChange {
  name?: string;
  allowPublicLinks?: boolean;
  allowSelfApproval?: boolean;
}

/** Owner's settings. Only the fields given change; the audit entry lists old and new values. */
export async function updateWorkspaceSettings(
  workspaceId: string,
  actorId: string,
  change: WorkspaceSettingsChange,
): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(workspaces).where(eq(workspaces.id, workspaceId)).for("update");
    if (!before) throw new AppError("not_found", "No such workspace.");
    const set: WorkspaceSettingsChange = {};
    const detail: Record<string, { from: unknown; to: unknown }> = {};
    for (const key of ["name", "allowPublicLinks", "allowSelfApproval"] as const) {
      const value = change[key];
      if (value !== undefined && value !== before[key]) {
        (set as Record<string, unknown>)[key] = value;
        detail[key] = { from: before[key], to: value };
      }
    }
    if (Object.keys(set).length === 0) return;
    await tx.update(workspaces).set(set).where(eq(workspaces.id, workspaceId));
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "workspace.settings",
      targetType: "workspace",
      targetId: workspaceId,
      detail,
    });
  });
}

/** Deletes the workspace with everything in it (designs, revisions, memberships, audit log cascade). */
export async function deleteWorkspace(workspaceId: string): Promise<void> {
  const deleted = await getDb().delete(workspaces).where(eq(workspaces.id, workspaceId)).returning({ id: workspaces.id });
  if (deleted.length === 0) throw new AppError("not_found", "No such workspace.");
}
