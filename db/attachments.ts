import "server-only";
/**
 * Attachment rows (photos, PDFs, sign-off reports): metadata here, the bytes in object storage. Served only as a
 * download (app/_server/serve-attachment.ts), never inline.
 */
import { and, desc, eq } from "drizzle-orm";
import type { AttachmentSummary } from "@/components/schemas/attachment";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { assertId } from "./designs";
import { AppError } from "./errors";
import { attachments, designs, reviews, users } from "./schema";

export interface AttachmentRecord extends AttachmentSummary<Date> {
  designId: string;
  storageKey: string;
}

export interface NewAttachment {
  workspaceId: string;
  designId: string;
  reviewId: string | null;
  storageKey: string;
  filename: string;
  contentType: string;
  sizeBytes: number;
  caption?: string | null;
  uploadedBy: string;
  /** audit verb: "attachment.upload" or "report.attach" */
  action: string;
}

const columns = {
  id: attachments.id,
  designId: attachments.designId,
  reviewId: attachments.reviewId,
  storageKey: attachments.storageKey,
  filename: attachments.filename,
  contentType: attachments.contentType,
  sizeBytes: attachments.sizeBytes,
  caption: attachments.caption,
  uploadedById: attachments.uploadedBy,
  uploadedByName: users.name,
  createdAt: attachments.createdAt,
};

/** A review named for an attachment must belong to the design. */
export async function assertReviewOfDesign(designId: string, reviewId: string): Promise<void> {
  assertId(reviewId, "review");
  const [row] = await getDb().select({ id: reviews.id }).from(reviews).where(and(eq(reviews.id, reviewId), eq(reviews.designId, designId)));
  if (!row) throw new AppError("invalid_input", "That review is not one of this design's reviews.", { fields: { reviewId: "Choose a review of this design." } });
}

export async function insertAttachment(input: NewAttachment): Promise<{ id: string }> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx
      .insert(attachments)
      .values({
        designId: input.designId,
        reviewId: input.reviewId,
        storageKey: input.storageKey,
        filename: input.filename,
        contentType: input.contentType,
        sizeBytes: input.sizeBytes,
        caption: input.caption ?? null,
        uploadedBy: input.uploadedBy,
      })
      .returning({ id: attachments.id });
    await recordAudit(tx, {
      workspaceId: input.workspaceId,
      actorId: input.uploadedBy,
      action: input.action,
      targetType: "attachment",
      targetId: row.id,
      detail: { designId: input.designId, reviewId: input.reviewId, filename: input.filename },
    });
    return row;
  });
}

export async function getAttachment(workspaceId: string, designId: string, attachmentId: string): Promise<AttachmentRecord> {
  assertId(designId, "design");
  assertId(attachmentId, "attachment");
  const [row] = await getDb()
    .select(columns)
    .from(attachments)
    .innerJoin(designs, eq(designs.id, attachments.designId))
    .leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(and(eq(attachments.id, attachmentId), eq(attachments.designId, designId), eq(designs.workspaceId, workspaceId)));
  if (!row) throw new AppError("not_found", "No such attachment on this design.");
  return row;
}

export async function listAttachments(workspaceId: string, designId: string, reviewId?: string): Promise<AttachmentRecord[]> {
  assertId(designId, "design");
  const where = [eq(attachments.designId, designId), eq(designs.workspaceId, workspaceId)];
  if (reviewId) where.push(eq(attachments.reviewId, reviewId));
  return getDb()
    .select(columns)
    .from(attachments)
    .innerJoin(designs, eq(designs.id, attachments.designId))
    .leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(and(...where))
    .orderBy(desc(attachments.createdAt));
}

/**
 * Removes an attachment's row (with an audit entry) and returns its storage key so the caller can delete the object
 * after the row is gone: a failure in storage then leaves an orphan object, never a row pointing at nothing.
 */
export async function deleteAttachment(workspaceId: string, designId: string, attachmentId: string, actorId: string): Promise<AttachmentRecord> {
  const found = await getAttachment(workspaceId, designId, attachmentId);
  await getDb().transaction(async (tx) => {
    await tx.delete(attachments).where(eq(attachments.id, found.id));
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "attachment.delete",
      targetType: "attachment",
      targetId: found.id,
      detail: { designId, reviewId: found.reviewId, filename: found.filename },
    });
  });
  return found;
}
