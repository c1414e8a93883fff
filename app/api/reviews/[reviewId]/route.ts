import { route } from "@/app/_server/respond";
import { accessReview } from "@/app/_server/review-access";
import { getReviewDetail } from "@/db/review-detail";

export const dynamic = "force-dynamic";

/** The review: revision, checks, reviewers and decisions, threads of remarks (each marked outdated or not). */
export const GET = route<{ params: Promise<{ reviewId: string }> }>(async (_request, { params }) => {
  const { reviewId } = await params;
  const { home } = await accessReview(reviewId, "design.read");
  const { revision, ...review } = await getReviewDetail(home.workspaceId, reviewId);
  const { circuit: _circuit, ...revisionSummary } = revision;
  return Response.json({ review: { ...review, revision: revisionSummary } });
});
