import { readJson, route } from "@/app/_server/respond";
import { restoreRevisionSchema } from "@/components/schemas/design";
import { restoreRevision } from "@/db/revisions";
import { access, type Params } from "../../../../_access";

export const dynamic = "force-dynamic";

/** Saves this old revision's circuit again as a new revision: { parentRevisionId (the head), message? } */
export const POST = route<Params<"designId" | "revisionId">>(async (request, { params }) => {
  const { workspaceId, designId, revisionId } = await params;
  const { user } = await access(workspaceId, "revision.create");
  const input = await readJson(request, restoreRevisionSchema);
  const revision = await restoreRevision(workspaceId, designId, user.id, revisionId, input);
  return Response.json({ revision }, { status: 201 });
});
