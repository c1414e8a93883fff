import { readJson, route } from "@/app/_server/respond";
import { renameDesignSchema } from "@/components/schemas/design";
import { deleteDesign, getDesign, renameDesign } from "@/db/designs";
import { access, type Params } from "../_access";

export const dynamic = "force-dynamic";

export const GET = route<Params<"designId">>(async (_request, { params }) => {
  const { workspaceId, designId } = await params;
  await access(workspaceId, "design.read");
  return Response.json({ design: await getDesign(workspaceId, designId) });
});

/** Rename: { title } */
export const PATCH = route<Params<"designId">>(async (request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "design.edit");
  const { title } = await readJson(request, renameDesignSchema);
  await renameDesign(workspaceId, designId, user.id, title);
  return Response.json({ design: await getDesign(workspaceId, designId) });
});

/** Soft delete; POST …/restore brings it back. */
export const DELETE = route<Params<"designId">>(async (_request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "design.delete");
  await deleteDesign(workspaceId, designId, user.id);
  return Response.json({ deleted: true });
});
