import "server-only";
import { uuidField } from "@/components/schemas/workspace";
import { AppError } from "@/db/errors";

export type WorkspaceContext = { params: Promise<{ workspaceId: string }> };

/** A malformed id can name no workspace: the same 404 as someone else's, so ids reveal nothing. */
export async function workspaceIdFrom(context: WorkspaceContext): Promise<string> {
  const { workspaceId } = await context.params;
  const parsed = uuidField("workspace").safeParse(workspaceId);
  if (!parsed.success) throw new AppError("not_found", "No such workspace, or you are not a member of it.");
  return parsed.data;
}
