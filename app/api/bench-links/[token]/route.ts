import { route } from "@/app/_server/respond";
import { openBenchLink } from "@/app/b/open-bench-link";
import { AppError } from "@/db/errors";

export const dynamic = "force-dynamic";

/** A bench link for programs (the live bench of the next issue): the revision's circuit and the link's view. */
export const GET = route<{ params: Promise<{ token: string }> }>(async (_request, { params }) => {
  const { token } = await params;
  const opening = await openBenchLink(token);
  if (opening.kind === "gone") throw new AppError("gone", opening.message, { detail: { reason: opening.reason } });
  if (opening.kind === "missing") throw new AppError("not_found", opening.message);
  if (opening.kind === "sign-in") throw new AppError("unauthenticated", "This bench link is not public: sign in as a member of its workspace.");
  const { link, revision, accessCount } = opening;
  return Response.json({
    design: { id: link.designId, title: link.designTitle, workspace: link.workspaceName },
    revision: { id: revision.id, number: revision.number, message: revision.message, authorName: revision.authorName, createdAt: revision.createdAt, circuit: revision.circuit },
    view: link.view,
    followsLatest: link.pinnedRevisionId === null,
    accessCount,
    expiresAt: link.expiresAt,
  });
});
