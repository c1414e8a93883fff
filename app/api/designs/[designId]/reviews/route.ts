import { kickNotificationMailer } from "@/app/_server/notification-mailer";
import { readJson, route } from "@/app/_server/respond";
import { accessDesign } from "@/app/_server/review-access";
import { createReviewSchema } from "@/components/schemas/review";
import { createReview, listReviews, reviewPath } from "@/db/reviews";

export const dynamic = "force-dynamic";

type Params = { params: Promise<{ designId: string }> };

/** The design's reviews, newest first. */
export const GET = route<Params>(async (_request, { params }) => {
  const { designId } = await params;
  await accessDesign(designId, "design.read");
  return Response.json({ reviews: await listReviews(designId) });
});

/** Requests a review: { revisionId, reviewerIds, dueAt?, message? }. The reviewers are told by inbox and mail. */
export const POST = route<Params>(async (request, { params }) => {
  const { designId } = await params;
  const { user, membership, home } = await accessDesign(designId, "review.request");
  const input = await readJson(request, createReviewSchema);
  const review = await createReview(
    { workspaceId: home.workspaceId, slug: home.slug, allowSelfApproval: membership.allowSelfApproval },
    designId,
    user,
    input,
  );
  kickNotificationMailer();
  return Response.json({ review, path: reviewPath(home.slug, designId, review.id) }, { status: 201 });
});
