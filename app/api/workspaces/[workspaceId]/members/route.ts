import { type WorkspaceContext, workspaceIdFrom } from "@/app/_server/params";
import { readJson, route } from "@/app/_server/respond";
import { requireAction } from "@/app/_server/session";
import { memberRemoveSchema, memberRoleChangeSchema } from "@/components/schemas/workspace";
import { changeMemberRole, listMembers, removeMember } from "@/db/members";

export const GET = route(async (_request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  await requireAction(workspaceId, "members.read");
  return Response.json({ members: await listMembers(workspaceId) });
});

/** An owner changes someone's role (the last owner cannot be demoted). */
export const PATCH = route(async (request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  const { user } = await requireAction(workspaceId, "members.manage");
  const input = await readJson(request, memberRoleChangeSchema);
  await changeMemberRole(workspaceId, user.id, input.userId, input.role);
  return Response.json({ members: await listMembers(workspaceId) });
});

/** An owner removes a member, or anyone leaves (their own id); the last owner can do neither. */
export const DELETE = route(async (request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  const { user } = await requireAction(workspaceId, "members.read");
  const input = await readJson(request, memberRemoveSchema);
  if (input.userId !== user.id) await requireAction(workspaceId, "members.manage");
  await removeMember(workspaceId, user.id, input.userId);
  return new Response(null, { status: 204 });
});
