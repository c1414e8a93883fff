import { attachmentHeaders } from "@/app/_server/attachment-types";
import { route } from "@/app/_server/respond";
import { getObject } from "@/app/_server/storage";
import { getAttachment } from "@/db/attachments";
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
