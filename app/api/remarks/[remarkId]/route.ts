import { kickNotificationMailer } from "@/app/_server/notification-mailer";
import { readJson, route } from "@/app/_server/respond";
import { accessRemark } from "@/app/_server/review-access";
import { resolveRemarkSchema } from "@/components/schemas/review";
import { setRemarkResolved } from "@/db/remarks";

export const dynamic = "force-dynamic";

/** Resolves { resolved: true } or reopens { resolved: false } the remark's thread. */
export const PATCH = route<{ params: Promise<{ remarkId: string }> }>(async (request, { params }) => {
  const { remarkId } = await params;
  const { user } = await accessRemark(remarkId, "review.remark");
  const { resolved } = await readJson(request, resolveRemarkSchema);
  await setRemarkResolved(remarkId, user, resolved);
  kickNotificationMailer();
  return Response.json({ resolved });
});
