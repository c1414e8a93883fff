import { MAX_ATTACHMENT_BYTES, sniffAttachmentType } from "@/app/_server/attachment-types";
import { readUpload } from "@/app/_server/read-upload";
import { route } from "@/app/_server/respond";
import { storageKey, storeThenRecord } from "@/app/_server/store-then-record";
import { attachmentFieldsSchema, attachmentListQuerySchema } from "@/components/schemas/attachment";
import { assertReviewOfDesign, insertAttachment, listAttachments } from "@/db/attachments";
import { getDesign } from "@/db/designs";
import { access, type Params } from "../../_access";

export const dynamic = "force-dynamic";

export const GET = route<Params<"designId">>(async (request, { params }) => {
  const { workspaceId, designId } = await params;
  await access(workspaceId, "design.read");
  // checked as an id first: a malformed one would otherwise reach PostgreSQL as a uuid it cannot read
  const { reviewId } = attachmentListQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  // an unknown or another workspace's design is 404, never an empty list that looks like a real one
  await getDesign(workspaceId, designId);
  const rows = await listAttachments(workspaceId, designId, reviewId);
  return Response.json({ attachments: rows.map(({ storageKey: _key, ...rest }) => rest) });
});

/** Upload a photo, PDF or text file (≤ 20 MB) with an optional caption, optionally to a review of the design (`reviewId`). */
export const POST = route<Params<"designId">>(async (request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "review.remark");
  await getDesign(workspaceId, designId);
  const upload = await readUpload(request, MAX_ATTACHMENT_BYTES, "attachment");
  const filename = (upload.file.name || "attachment").slice(0, 200);
  const contentType = sniffAttachmentType(upload.bytes, filename);
  const { caption, reviewId } = attachmentFieldsSchema.parse(upload.fields);
  if (reviewId) await assertReviewOfDesign(designId, reviewId);
  const key = storageKey(designId, "attachments", filename);
  const row = await storeThenRecord(key, upload.bytes, contentType, () =>
    insertAttachment({ workspaceId, designId, reviewId, storageKey: key, filename, contentType, sizeBytes: upload.bytes.byteLength, caption, uploadedBy: user.id, action: "attachment.upload" }),
  );
  return Response.json({ attachment: { id: row.id, filename, contentType, caption } }, { status: 201 });
});
