import { requireUser } from "@/app/_server/session";
import { readJson, route } from "@/app/_server/respond";
import { workspaceCreateSchema } from "@/components/schemas/workspace";
import { listMembershipsForUser } from "@/db/memberships";
import { createWorkspace } from "@/db/workspaces";

/** The caller's workspaces, with the caller's role in each. */
export const GET = route(async () => {
  const user = await requireUser();
  return Response.json({ workspaces: await listMembershipsForUser(user.id) });
});

/** Creates a workspace; the caller becomes its owner. */
export const POST = route(async (request: Request) => {
  const user = await requireUser();
  const input = await readJson(request, workspaceCreateSchema);
  const workspace = await createWorkspace(user.id, input.name);
  return Response.json({ workspace }, { status: 201 });
});
