import { requireAction } from "@/app/_server/session";
import { type WorkspaceContext, workspaceIdFrom } from "@/app/_server/params";
import { readJson, route } from "@/app/_server/respond";
import { workspaceSettingsSchema } from "@/components/schemas/workspace";
import { getMembership } from "@/db/memberships";
import { deleteWorkspace, updateWorkspaceSettings } from "@/db/workspaces";

export const PATCH = route(async (request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  const { user } = await requireAction(workspaceId, "workspace.settings");
  const input = await readJson(request, workspaceSettingsSchema);
  await updateWorkspaceSettings(workspaceId, user.id, input);
  return Response.json({ workspace: await getMembership(workspaceId, user.id) });
});

export const DELETE = route(async (_request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  await requireAction(workspaceId, "workspace.delete");
  await deleteWorkspace(workspaceId);
  return new Response(null, { status: 204 });
});
