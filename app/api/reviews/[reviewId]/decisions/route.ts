import { kickNotificationMailer } from "@/app/_server/notification-mailer";
import { readJson, route } from "@/app/_server/respond";
import { accessReview } from "@/app/_server/review-access";
import { decisionSchema } from "@/components/schemas/review";
import { decide } from "@/db/review-decisions";

export const dynamic = "force-dynamic";

/**
 * A decision { verdict: "approve" | "rework", reason }. Who may decide is the review rule
 * (components/reviews/review-rules.ts), checked inside the transaction: viewers never, designers only where allowed.
 */
export const POST = route<{ params: Promise<{ reviewId: string }> }>(async (request, { params }) => {
  const { reviewId } = await params;
  const { user, membership } = await accessReview(reviewId, "design.read");
  const input = await readJson(request, decisionSchema);
  const result = await decide(reviewId, { ...user, role: membership.role, allowSelfApproval: membership.allowSelfApproval }, input);
  kickNotificationMailer();
  return Response.json(result, { status: 201 });
});
