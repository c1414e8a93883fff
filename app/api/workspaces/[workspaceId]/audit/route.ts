import { type WorkspaceContext, workspaceIdFrom } from "@/app/_server/params";
import { route } from "@/app/_server/respond";
import { requireAction } from "@/app/_server/session";
import { auditQuerySchema } from "@/components/schemas/workspace";
import { listAudit } from "@/db/audit";

export const GET = route(async (request: Request, context: WorkspaceContext) => {
  const workspaceId = await workspaceIdFrom(context);
  await requireAction(workspaceId, "audit.read");
  const params = Object.fromEntries(new URL(request.url).searchParams);
  const query = auditQuerySchema.parse(params);
  const limit = query.limit ?? 50;
  const entries = await listAudit(workspaceId, { limit, before: query.before });
  return Response.json({ entries, nextBefore: entries.length === limit ? entries[entries.length - 1].id : null });
});
