import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { assertId, getDesign, lockDesign } from "./designs";
import { checkCircuit } from "./designs-circuit";
import { AppError } from "./errors";
import { storeRevisionChecks } from "./revision-checks";
import { notifyRevisionUnderReview } from "./reviews";
import { designRevisions, designs, users } from "./schema";

export interface RevisionSummary {
  id: string;
  number: number;
  parentId: string | null;
  message: string;
  authorId: string;
  authorName: string | null;
  createdAt: Date;
}

export interface Revision extends RevisionSummary {
  designId: string;
  circuit: Record<string, unknown>;
  layout: Record<string, unknown>;
}

const summaryColumns = {
  id: designRevisions.id,
  number: designRevisions.number,
  parentId: designRevisions.parentId,
  message: designRevisions.message,
  authorId: designRevisions.authorId,
  authorName: users.name,
  createdAt: designRevisions.createdAt,
};

/** Newest first. The design must belong to the workspace (checked, so other workspaces' ids are 404). */
export async function listRevisions(workspaceId: string, designId: string): Promise<RevisionSummary[]> {
  await getDesign(workspaceId, designId);
  return getDb()
    .select(summaryColumns)
    .from(designRevisions)
    .innerJoin(users, eq(users.id, designRevisions.authorId))
    .where(eq(designRevisions.designId, designId))
    .orderBy(desc(designRevisions.number));
}

/** One revision of a design of the workspace, with its circuit. */
export async function getRevision(
  workspaceId: string,
  designId: string,
  revisionId: string,
  options: { includeDeletedDesign?: boolean } = {},
): Promise<Revision> {
  await getDesign(workspaceId, designId, { includeDeleted: options.includeDeletedDesign });
  assertId(revisionId, "revision");
  const rows = await getDb()
    .select({ ...summaryColumns, designId: designRevisions.designId, circuit: designRevisions.circuit, layout: designRevisions.layout })
    .from(designRevisions)
    .innerJoin(users, eq(users.id, designRevisions.authorId))
    .where(and(eq(designRevisions.designId, designId), eq(designRevisions.id, revisionId)))
    .limit(1);
  const row = rows[0];
  if (!row) throw new AppError("not_found", "No such revision of this design.");
  return row as Revision;
}

/** What a 409 tells the person: the head that someone else saved while they worked. */
export interface HeadConflictDetail {
  headRevisionId: string;
  headNumber: number;
  authorName: string | null;
  savedAt: string;
}

export interface SaveRevisionValues {
  parentRevisionId: string | null;
  circuit: unknown;
  message: string;
  layout?: Record<string, unknown>;
}

/**
 * Saves a new immutable revision on top of the head. The design row is locked (SELECT … FOR UPDATE) for the whole
 * transaction, so of any number of concurrent saves naming the same parent exactly one finds the head unchanged;
 * the others wait for the lock, see the new head and get 409 with who saved first. Nothing of theirs is stored.
 */
export async function saveRevision(
  workspaceId: string,
  designId: string,
  actorId: string,
  values: SaveRevisionValues,
  audit: { restoredFrom?: { id: string; number: number } } = {},
): Promise<RevisionSummary> {
  const circuit = checkCircuit(values.circuit);
  const saved = await getDb().transaction(async (tx) => {
    const design = await lockDesign(tx, workspaceId, designId);
    const headRows = design.headRevisionId
      ? await tx
          .select({ id: designRevisions.id, number: designRevisions.number, createdAt: designRevisions.createdAt, authorName: users.name })
          .from(designRevisions)
          .innerJoin(users, eq(users.id, designRevisions.authorId))
          .where(eq(designRevisions.id, design.headRevisionId))
      : [];
    const current = headRows[0] ?? null;
    if ((current?.id ?? null) !== values.parentRevisionId) {
      const detail: HeadConflictDetail | null = current
        ? { headRevisionId: current.id, headNumber: current.number, authorName: current.authorName, savedAt: current.createdAt.toISOString() }
        : null;
      const who = current ? `${current.authorName ?? "Someone"} saved r${current.number} at ${current.createdAt.toISOString()}` : "The design changed";
      throw new AppError(
        "conflict",
        `${who} after you started from this revision. Your changes were not saved; they are still in your editor — compare them with r${current?.number ?? "?"} or fork.`,
        { detail },
      );
    }
    const number = (current?.number ?? 0) + 1;
    const [revision] = await tx
      .insert(designRevisions)
      .values({ designId, number, parentId: current?.id ?? null, circuit, layout: values.layout ?? {}, message: values.message, authorId: actorId })
      .returning();
    await tx.update(designs).set({ headRevisionId: revision.id, updatedAt: new Date() }).where(eq(designs.id, designId));
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "revision.create",
      targetType: "revision",
      targetId: revision.id,
      detail: { designId, number, message: values.message, ...(audit.restoredFrom ? { restoredFrom: audit.restoredFrom } : {}) },
    });
    await notifyRevisionUnderReview(tx, { designId, actorId, number, message: values.message });
    const [author] = await tx.select({ name: users.name }).from(users).where(eq(users.id, actorId));
    return { ...revision, authorName: author?.name ?? null } as RevisionSummary;
  });
  // after the commit: the engine's figures and target checks (the review issue); a save never fails on them
  await storeRevisionChecks(saved.id, circuit).catch((error) => console.error("revision checks:", error));
  return saved;
}

/** Restoring an old revision saves its circuit again as a new revision on top of the head; history is never rewritten. */
export async function restoreRevision(
  workspaceId: string,
  designId: string,
  actorId: string,
  revisionId: string,
  values: { parentRevisionId: string; message?: string },
): Promise<RevisionSummary> {
  const old = await getRevision(workspaceId, designId, revisionId);
  return saveRevision(
    workspaceId,
    designId,
    actorId,
    {
      parentRevisionId: values.parentRevisionId,
      circuit: old.circuit,
      layout: old.layout,
      message: values.message?.trim() || `Restored r${old.number}`,
    },
    { restoredFrom: { id: old.id, number: old.number } },
  );
}
