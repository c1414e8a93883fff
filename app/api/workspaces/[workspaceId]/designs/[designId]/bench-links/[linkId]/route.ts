import { route } from "@/app/_server/respond";
import { revokeShareLink } from "@/db/share-links";
import { access, type Params } from "../../../_access";

export const dynamic = "force-dynamic";

/** Revokes the link: from now on /b/<token> answers 410. */
export const DELETE = route<Params<"designId" | "linkId">>(async (_request, { params }) => {
  const { workspaceId, designId, linkId } = await params;
  const { user } = await access(workspaceId, "share.manage");
  await revokeShareLink(workspaceId, designId, linkId, user.id);
  return Response.json({ revoked: true });
});
