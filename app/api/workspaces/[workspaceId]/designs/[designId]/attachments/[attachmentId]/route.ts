import { attachmentHeaders } from "@/app/_server/attachment-types";
import { route } from "@/app/_server/respond";
import { deleteObjectQuietly, getObject } from "@/app/_server/storage";
import { mayDeleteAttachment } from "@/components/schemas/attachment";
import { deleteAttachment, getAttachment } from "@/db/attachments";
import { AppError } from "@/db/errors";
import { access, type Params } from "../../../_access";

export const dynamic = "force-dynamic";

/** The stored file, as a download only (Content-Disposition: attachment, nosniff, sandboxed). */
export const GET = route<Params<"designId" | "attachmentId">>(async (_request, { params }) => {
  const { workspaceId, designId, attachmentId } = await params;
  await access(workspaceId, "design.read");
  const a = await getAttachment(workspaceId, designId, attachmentId);
  const bytes = await getObject(a.storageKey);
  return new Response(Buffer.from(bytes), { headers: attachmentHeaders(a.filename, a.contentType, bytes.byteLength) });
});

/** Delete an attachment: owners and designers any, others only their own (components/schemas/attachment.ts). */
export const DELETE = route<Params<"designId" | "attachmentId">>(async (_request, { params }) => {
  const { workspaceId, designId, attachmentId } = await params;
  const { user, membership } = await access(workspaceId, "design.read");
  const a = await getAttachment(workspaceId, designId, attachmentId);
  if (!mayDeleteAttachment(membership.role, a.uploadedById === user.id)) {
    throw new AppError("forbidden", `Your role (${membership.role}) may delete only attachments you uploaded. Ask a designer or an owner.`);
  }
  await deleteAttachment(workspaceId, designId, attachmentId, user.id);
  // The row is gone first; a storage hiccup now leaves an unreachable object, never a listed file that is missing.
  await deleteObjectQuietly(a.storageKey);
  return new Response(null, { status: 204 });
});
