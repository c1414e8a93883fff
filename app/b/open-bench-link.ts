import "server-only";
import { getSessionUser, requireAction } from "@/app/_server/session";
import { AppError } from "@/db/errors";
import { getRevision, type Revision } from "@/db/revisions";
import { findShareLink, type OpenedShareLink, recordShareAccess } from "@/db/share-links";

export type BenchLinkOpening =
  | { kind: "open"; link: OpenedShareLink; revision: Revision; accessCount: number }
  | { kind: "sign-in" }
  | { kind: "gone"; reason: string; message: string }
  | { kind: "missing"; message: string };

/**
 * Opens a bench link for the page and the API alike: revoked or expired → gone; not public (or the workspace no
 * longer allows public links) → sign-in, then membership of the design's workspace; otherwise the revision it
 * shows, and the opening is counted.
 */
export async function openBenchLink(token: string): Promise<BenchLinkOpening> {
  let link: OpenedShareLink;
  try {
    link = await findShareLink(token);
  } catch (error) {
    if (error instanceof AppError && error.code === "gone") {
      return { kind: "gone", reason: (error.detail as { reason: string }).reason, message: error.message };
    }
    if (error instanceof AppError && error.code === "not_found") return { kind: "missing", message: error.message };
    throw error;
  }
  if (!link.opensWithoutSignIn) {
    if (!(await getSessionUser())) return { kind: "sign-in" };
    try {
      await requireAction(link.workspaceId, "design.read");
    } catch (error) {
      if (error instanceof AppError && error.code === "not_found") {
        return { kind: "missing", message: "This bench link is for members of the design's workspace only." };
      }
      throw error;
    }
  }
  const revision = await getRevision(link.workspaceId, link.designId, link.revisionId);
  const accessCount = await recordShareAccess(link.linkId);
  return { kind: "open", link, revision, accessCount };
}
