/**
 * An attachment's form fields and limits, shared by the upload form (shown up front, checked before sending) and the
 * route handler (checked again on the server, which alone decides the type from the file's first bytes).
 */
import { z } from "zod";
import { type Role, can } from "@/components/auth/roles";

/** Largest attachment accepted, bytes (a phone photo or a report PDF). */
export const MAX_ATTACHMENT_BYTES = 20_000_000;

/** What the file picker offers; the server still sniffs the bytes and refuses anything else. */
export const ATTACHMENT_ACCEPT = "image/png,image/jpeg,image/webp,application/pdf,.txt,.csv,.tsv";

/** The limits in words, shown beside the picker and in the server's refusal. */
export const ATTACHMENT_LIMITS_TEXT = "a photo (PNG, JPEG, WebP), a PDF, or a text file (.txt, .csv, .tsv), up to 20 MB";

export const CAPTION_MAX_CHARS = 200;

/** One attachment as listed (the storage key never leaves the server); `T` is Date on the server, string in JSON. */
export interface AttachmentSummary<T = string> {
  id: string;
  reviewId: string | null;
  filename: string;
  contentType: string;
  sizeBytes: number;
  caption: string | null;
  uploadedById: string;
  uploadedByName: string | null;
  createdAt: T;
}

export const attachmentFieldsSchema = z.object({
  caption: z
    .string()
    .trim()
    .max(CAPTION_MAX_CHARS, { error: `Keep the caption to ${CAPTION_MAX_CHARS} characters or fewer.` })
    .default("")
    .transform((c) => c || null),
  /** Omitted or empty: the attachment belongs to the design, not to one review. */
  reviewId: z
    .union([z.literal(""), z.uuid({ error: "reviewId must be a review of this design." })])
    .optional()
    .transform((id) => id || null),
});
export type AttachmentFields = z.output<typeof attachmentFieldsSchema>;

/** The list's query: `?reviewId=` narrows it to one review's attachments (omitted or empty: all of the design's). */
export const attachmentListQuerySchema = z.object({
  reviewId: z
    .union([z.literal(""), z.uuid({ error: "reviewId must be the id of a review of this design." })])
    .optional()
    .transform((id) => id || undefined),
});

/** Owners and designers may delete any attachment of a design; whoever uploaded one may delete their own. */
export function mayDeleteAttachment(role: Role, isUploader: boolean): boolean {
  return can(role, "design.edit") || (isUploader && can(role, "review.remark"));
}
