import "server-only";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { getDesign, insertDesignWithRevision } from "./designs";
import { getRevision } from "./revisions";

/**
 * Copies one revision of a design into another workspace (or the same) as a new design whose first revision holds
 * that circuit. The caller has checked the person may read the source and create designs in the target.
 */
export async function forkDesign(values: {
  sourceWorkspaceId: string;
  designId: string;
  revisionId?: string;
  targetWorkspaceId: string;
  actorId: string;
  title?: string;
}): Promise<{ designId: string; revisionId: string }> {
  const source = await getDesign(values.sourceWorkspaceId, values.designId);
  const revisionId = values.revisionId ?? source.headRevisionId;
  const revision = await getRevision(values.sourceWorkspaceId, values.designId, revisionId ?? "");
  const title = values.title?.trim() || `${source.title} (fork)`;
  const message = `Forked from ${source.title} r${revision.number}`;
  return getDb().transaction(async (tx) => {
    const created = await insertDesignWithRevision(tx, {
      workspaceId: values.targetWorkspaceId,
      title,
      createdBy: values.actorId,
      circuit: revision.circuit,
      message,
      forkedFromDesignId: source.id,
      forkedFromRevisionId: revision.id,
    });
    await recordAudit(tx, {
      workspaceId: values.targetWorkspaceId,
      actorId: values.actorId,
      action: "design.create",
      targetType: "design",
      targetId: created.designId,
      detail: { title, forkedFrom: { designId: source.id, revisionId: revision.id, workspaceId: values.sourceWorkspaceId } },
    });
    await recordAudit(tx, {
      workspaceId: values.targetWorkspaceId,
      actorId: values.actorId,
      action: "revision.create",
      targetType: "revision",
      targetId: created.revisionId,
      detail: { designId: created.designId, number: 1, message },
    });
    return created;
  });
}
