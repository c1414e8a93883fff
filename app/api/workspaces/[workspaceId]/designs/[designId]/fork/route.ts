import { readJson, route } from "@/app/_server/respond";
import { forkDesignSchema } from "@/components/schemas/design";
import { getDesign } from "@/db/designs";
import { forkDesign } from "@/db/designs-fork";
import { access, type Params } from "../../_access";

export const dynamic = "force-dynamic";

/** Forks a revision (default: the latest) into a workspace where the caller is a designer or owner. */
export const POST = route<Params<"designId">>(async (request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "design.read");
  const input = await readJson(request, forkDesignSchema);
  await access(input.targetWorkspaceId, "design.create");
  const created = await forkDesign({ sourceWorkspaceId: workspaceId, designId, actorId: user.id, ...input });
  return Response.json(
    { design: await getDesign(input.targetWorkspaceId, created.designId), workspaceId: input.targetWorkspaceId },
    { status: 201 },
  );
});
