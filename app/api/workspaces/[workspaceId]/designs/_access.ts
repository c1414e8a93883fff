import "server-only";
import { requireAction } from "@/app/_server/session";
import type { Action } from "@/components/auth/roles";
import { assertId } from "@/db/designs";

/** Route params of the designs API (Next passes them as a promise). */
export type Params<T extends string = never> = { params: Promise<Record<"workspaceId" | T, string>> };

/**
 * The session and role check every designs route starts with: a workspace id that is not an id, or one the caller
 * does not belong to, is 404; a role without the action is 403 (components/auth/roles.ts).
 */
export async function access(workspaceId: string, action: Action) {
  assertId(workspaceId, "workspace");
  return requireAction(workspaceId, action);
}

/** Body limit of a save: the 1 MB circuit plus room for the message and ids around it. */
export const SAVE_BODY_LIMIT_BYTES = 1_100_000;
