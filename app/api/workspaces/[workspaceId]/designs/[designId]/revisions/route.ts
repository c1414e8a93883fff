import { readJson, route } from "@/app/_server/respond";
import { saveRevisionSchema } from "@/components/schemas/design";
import { listRevisions, saveRevision } from "@/db/revisions";
import { access, type Params, SAVE_BODY_LIMIT_BYTES } from "../../_access";

export const dynamic = "force-dynamic";

export const GET = route<Params<"designId">>(async (_request, { params }) => {
  const { workspaceId, designId } = await params;
  await access(workspaceId, "design.read");
  return Response.json({ revisions: await listRevisions(workspaceId, designId) });
});

/**
 * Saves a revision: { parentRevisionId, circuit, message }. 409 when someone saved first (detail: the head, who,
 * when); nothing is stored then and the client keeps its draft.
 */
export const POST = route<Params<"designId">>(async (request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "revision.create");
  const input = await readJson(request, saveRevisionSchema, SAVE_BODY_LIMIT_BYTES);
  const revision = await saveRevision(workspaceId, designId, user.id, input);
  return Response.json({ revision }, { status: 201 });
});
