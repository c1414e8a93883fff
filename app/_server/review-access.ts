import "server-only";
import type { Action } from "@/components/auth/roles";
import { AppError } from "@/db/errors";
import { remarkHome } from "@/db/remarks";
import { designHome, reviewHome } from "@/db/reviews";
import { requireAction, requireUser } from "./session";

/**
 * Session and role checks for the routes addressed by a design, review or remark id alone: the id leads to its
 * workspace, then the caller's membership is checked there. Not a member reads the same 404 as an unknown id.
 */
async function inWorkspace(workspaceId: string, action: Action, what: string) {
  await requireUser(); // signed out is 401 before anything about the id is told
  try {
    return await requireAction(workspaceId, action);
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") throw new AppError("not_found", `No such ${what}, or you are not a member of its workspace.`);
    throw error;
  }
}

export async function accessDesign(designId: string, action: Action) {
  await requireUser();
  const home = await designHome(designId);
  return { ...(await inWorkspace(home.workspaceId, action, "design")), home };
}

export async function accessReview(reviewId: string, action: Action) {
  await requireUser();
  const home = await reviewHome(reviewId);
  return { ...(await inWorkspace(home.workspaceId, action, "review")), home };
}

export async function accessRemark(remarkId: string, action: Action) {
  await requireUser();
  const home = await remarkHome(remarkId);
  return { ...(await inWorkspace(home.workspaceId, action, "remark")), home };
}
