import "server-only";
import { and, desc, eq } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { decideRefusal } from "@/components/reviews/review-rules";
import type { DecisionInput } from "@/components/schemas/review";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { AppError } from "./errors";
import { notify } from "./notifications";
import { getRevisionChecks } from "./revision-checks";
import { reviewPath, reviewPeople } from "./reviews";
import { decisions, designRevisions, designs, reviewReviewers, reviews, revisionChecks, workspaces } from "./schema";

/**
 * A reviewer's decision. "rework" closes the review at once and sends the design to rework; "approve" closes it as
 * approved when every requested reviewer's latest verdict is approve (an owner deciding without being asked counts as
 * one of them), and then locks the revision's record (revision_checks.approved_at). A closed review takes no more
 * decisions: a new revision gets a new review.
 */
export async function decide(
  reviewId: string,
  actor: { id: string; name: string | null; role: Role; allowSelfApproval: boolean },
  input: DecisionInput,
): Promise<{ reviewStatus: "open" | "approved" | "rework"; designStatus: string }> {
  const [target] = await getDb().select({ revisionId: reviews.revisionId }).from(reviews).where(eq(reviews.id, reviewId));
  if (!target) throw new AppError("not_found", "No such review.");
  // the checks exist before the approval can lock them (revisions saved before checks get theirs now)
  await getRevisionChecks(target.revisionId);
  return getDb().transaction(async (tx) => {
    const [review] = await tx
      .select({
        id: reviews.id,
        status: reviews.status,
        designId: reviews.designId,
        revisionId: reviews.revisionId,
        authorId: designRevisions.authorId,
        number: designRevisions.number,
        title: designs.title,
        workspaceId: designs.workspaceId,
        slug: workspaces.slug,
      })
      .from(reviews)
      .innerJoin(designRevisions, eq(designRevisions.id, reviews.revisionId))
      .innerJoin(designs, eq(designs.id, reviews.designId))
      .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
      .where(eq(reviews.id, reviewId))
      .for("update", { of: reviews });
    const asked = await tx.select({ userId: reviewReviewers.userId }).from(reviewReviewers).where(eq(reviewReviewers.reviewId, reviewId));
    const refusal = decideRefusal(input.verdict, {
      role: actor.role,
      allowSelfApproval: actor.allowSelfApproval,
      isRequestedReviewer: asked.some((a) => a.userId === actor.id),
      isAuthor: review.authorId === actor.id,
    });
    if (refusal) throw new AppError("forbidden", refusal);
    if (review.status !== "open") {
      throw new AppError("conflict", `This review is closed (${review.status}). Save a new revision and request a new review to decide again.`);
    }
    if (!asked.some((a) => a.userId === actor.id)) await tx.insert(reviewReviewers).values({ reviewId, userId: actor.id });
    await tx.insert(decisions).values({ reviewId, revisionId: review.revisionId, reviewerId: actor.id, verdict: input.verdict, reason: input.reason.trim() });
    const all = await tx
      .select({ reviewerId: decisions.reviewerId, verdict: decisions.verdict })
      .from(decisions)
      .where(eq(decisions.reviewId, reviewId))
      .orderBy(desc(decisions.createdAt));
    const latest = new Map<string, string>();
    for (const row of all) if (!latest.has(row.reviewerId)) latest.set(row.reviewerId, row.verdict);
    const reviewerIds = new Set([...asked.map((a) => a.userId), actor.id]);
    const reviewStatus =
      input.verdict === "rework" ? "rework" : [...reviewerIds].every((id) => latest.get(id) === "approve") ? "approved" : "open";
    if (reviewStatus !== "open") {
      const now = new Date();
      await tx.update(reviews).set({ status: reviewStatus, closedAt: now }).where(eq(reviews.id, reviewId));
      await tx.update(designs).set({ status: reviewStatus, updatedAt: now }).where(eq(designs.id, review.designId));
      if (reviewStatus === "approved") {
        await tx.update(revisionChecks).set({ approvedAt: now }).where(and(eq(revisionChecks.revisionId, review.revisionId)));
      }
    }
    await recordAudit(tx, {
      workspaceId: review.workspaceId,
      actorId: actor.id,
      action: "review.decide",
      targetType: "review",
      targetId: reviewId,
      detail: { verdict: input.verdict, revision: review.number, reviewStatus },
    });
    const verdictWords = input.verdict === "approve" ? "approved" : "asked for rework on";
    await notify(tx, [...(await reviewPeople(tx, reviewId)), review.authorId], actor.id, {
      kind: "decision.made",
      title: `${actor.name ?? "A reviewer"} ${verdictWords} ${review.title} r${review.number}`,
      body: [input.reason.trim(), reviewStatus === "open" ? "The review stays open for the other reviewers." : `The review is now ${reviewStatus}.`].join("\n"),
      link: reviewPath(review.slug, review.designId, reviewId),
    });
    return { reviewStatus, designStatus: reviewStatus === "open" ? "in_review" : reviewStatus };
  });
}
