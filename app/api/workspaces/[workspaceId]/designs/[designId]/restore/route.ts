import { route } from "@/app/_server/respond";
import { getDesign, restoreDesign } from "@/db/designs";
import { access, type Params } from "../../_access";

export const dynamic = "force-dynamic";

/** Brings a soft-deleted design back into the table. */
export const POST = route<Params<"designId">>(async (_request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "design.delete");
  await restoreDesign(workspaceId, designId, user.id);
  return Response.json({ design: await getDesign(workspaceId, designId) });
});
