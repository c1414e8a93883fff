import { kickNotificationMailer } from "@/app/_server/notification-mailer";
import { readJson, route } from "@/app/_server/respond";
import { accessReview } from "@/app/_server/review-access";
import { createRemarkSchema } from "@/components/schemas/review";
import { addRemark } from "@/db/remarks";

export const dynamic = "force-dynamic";

/** A remark { body, anchor } or a reply { body, parentId }. Viewers cannot remark (403). */
export const POST = route<{ params: Promise<{ reviewId: string }> }>(async (request, { params }) => {
  const { reviewId } = await params;
  const { user } = await accessReview(reviewId, "review.remark");
  const input = await readJson(request, createRemarkSchema);
  const remark = await addRemark(reviewId, user, input);
  kickNotificationMailer();
  return Response.json({ remark }, { status: 201 });
});
