import { route } from "@/app/_server/respond";
import { getRevision } from "@/db/revisions";
import { access, type Params } from "../../../_access";

export const dynamic = "force-dynamic";

export const GET = route<Params<"designId" | "revisionId">>(async (_request, { params }) => {
  const { workspaceId, designId, revisionId } = await params;
  await access(workspaceId, "design.read");
  return Response.json({ revision: await getRevision(workspaceId, designId, revisionId) });
});
