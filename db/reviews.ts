import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { reviewersOfferedTo } from "@/components/reviews/review-rules";
import type { CreateReviewInput } from "@/components/schemas/review";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { assertId } from "./designs";
import { AppError } from "./errors";
import { notify } from "./notifications";
import { designRevisions, designs, memberships, reviewReviewers, reviews, users, workspaces } from "./schema";

type Tx = Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0];

/** The workspace a design belongs to, for routes addressed by design id alone (a deleted design is 404). */
export async function designHome(designId: string) {
  assertId(designId, "design");
  const [row] = await getDb()
    .select({ workspaceId: designs.workspaceId, slug: workspaces.slug, title: designs.title, deletedAt: designs.deletedAt })
    .from(designs)
    .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
    .where(eq(designs.id, designId));
  if (!row || row.deletedAt) throw new AppError("not_found", "No such design, or you are not a member of its workspace.");
  return row;
}

/** The design and workspace a review belongs to. */
export async function reviewHome(reviewId: string) {
  assertId(reviewId, "review");
  const [row] = await getDb()
    .select({ designId: reviews.designId, workspaceId: designs.workspaceId, slug: workspaces.slug })
    .from(reviews)
    .innerJoin(designs, eq(designs.id, reviews.designId))
    .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
    .where(eq(reviews.id, reviewId));
  if (!row) throw new AppError("not_found", "No such review, or you are not a member of its workspace.");
  return row;
}

export const reviewPath = (slug: string, designId: string, reviewId: string) => `/w/${slug}/designs/${designId}/reviews/${reviewId}`;

export interface EligibleReviewer {
  id: string;
  name: string | null;
  email: string;
  role: Role;
}

/** The members `requesterId` may ask to review (review-rules.ts reviewersOfferedTo: the dialog's list and the server's check). */
export async function listEligibleReviewers(workspaceId: string, allowSelfApproval: boolean, requesterId: string): Promise<EligibleReviewer[]> {
  const rows = await getDb()
    .select({ id: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(asc(users.name), asc(users.email));
  return reviewersOfferedTo(rows, requesterId, { allowSelfApproval });
}

/** Everyone a review's events reach: who asked and who was asked. */
export async function reviewPeople(tx: Pick<Tx, "select">, reviewId: string): Promise<string[]> {
  const [review] = await tx.select({ requestedBy: reviews.requestedBy }).from(reviews).where(eq(reviews.id, reviewId));
  const reviewers = await tx.select({ userId: reviewReviewers.userId }).from(reviewReviewers).where(eq(reviewReviewers.reviewId, reviewId));
  return [...(review ? [review.requestedBy] : []), ...reviewers.map((r) => r.userId)];
}

function parseDue(dueAt: string | undefined): Date | null {
  if (!dueAt) return null;
  // a bare day is due at the end of that day, UTC
  const date = new Date(/^\d{4}-\d{2}-\d{2}$/.test(dueAt) ? `${dueAt}T23:59:59Z` : dueAt);
  if (Number.isNaN(date.getTime())) throw new AppError("invalid_input", "The due date is not a date.", { fields: { dueAt: "Give a date such as 2026-12-24." } });
  return date;
}

/**
 * Opens a review of one revision: the reviewers must be members who can review (reviewers, owners; designers where
 * the workspace allows), and not the requester. The design goes to "in review"; each reviewer gets a notification.
 */
export async function createReview(
  home: { workspaceId: string; slug: string; allowSelfApproval: boolean },
  designId: string,
  actor: { id: string; name: string | null },
  input: CreateReviewInput,
): Promise<{ id: string }> {
  const dueAt = parseDue(input.dueAt);
  if (dueAt && dueAt.getTime() < Date.now() - 24 * 3600_000) {
    throw new AppError("invalid_input", "The due date is in the past. Choose a day from today on.", { fields: { dueAt: "Choose a day from today on." } });
  }
  const eligible = new Map((await listEligibleReviewers(home.workspaceId, home.allowSelfApproval, actor.id)).map((p) => [p.id, p]));
  const reviewerIds = [...new Set(input.reviewerIds)];
  for (const id of reviewerIds) {
    if (id === actor.id) throw new AppError("invalid_input", "You cannot review your own request. Pick someone else.", { fields: { reviewerIds: "Pick someone other than yourself." } });
    if (!eligible.has(id)) {
      throw new AppError("invalid_input", "One of the people picked cannot review in this workspace (only reviewers and owners, and designers where allowed).", {
        fields: { reviewerIds: "Pick reviewers from the list." },
      });
    }
  }
  return getDb().transaction(async (tx) => {
    const [revision] = await tx
      .select({ id: designRevisions.id, number: designRevisions.number, title: designs.title })
      .from(designRevisions)
      .innerJoin(designs, eq(designs.id, designRevisions.designId))
      .where(and(eq(designRevisions.id, input.revisionId), eq(designRevisions.designId, designId), eq(designs.workspaceId, home.workspaceId)));
    if (!revision) throw new AppError("not_found", "No such revision of this design.", { fields: { revisionId: "Pick a revision of this design." } });
    const [review] = await tx
      .insert(reviews)
      .values({ designId, revisionId: revision.id, requestedBy: actor.id, message: input.message ?? "", dueAt })
      .returning({ id: reviews.id });
    await tx.insert(reviewReviewers).values(reviewerIds.map((userId) => ({ reviewId: review.id, userId })));
    await tx.update(designs).set({ status: "in_review", updatedAt: new Date() }).where(eq(designs.id, designId));
    await recordAudit(tx, {
      workspaceId: home.workspaceId,
      actorId: actor.id,
      action: "review.request",
      targetType: "review",
      targetId: review.id,
      detail: { designId, revision: revision.number, reviewers: reviewerIds.length },
    });
    const due = dueAt ? ` by ${dueAt.toISOString().slice(0, 10)}` : "";
    await notify(tx, reviewerIds, actor.id, {
      kind: "review.requested",
      title: `${actor.name ?? "Someone"} asks you to review ${revision.title} r${revision.number}`,
      body: [`Please review r${revision.number} of ${revision.title}${due}.`, input.message?.trim() ?? ""].filter(Boolean).join("\n"),
      link: reviewPath(home.slug, designId, review.id),
    });
    return review;
  });
}

export interface ReviewSummary {
  id: string;
  revisionId: string;
  revisionNumber: number;
  status: "open" | "approved" | "rework" | "withdrawn";
  message: string;
  dueAt: Date | null;
  createdAt: Date;
  requestedByName: string | null;
  reviewerNames: (string | null)[];
}

export async function listReviews(designId: string): Promise<ReviewSummary[]> {
  const rows = await getDb()
    .select({
      id: reviews.id,
      revisionId: reviews.revisionId,
      revisionNumber: designRevisions.number,
      status: reviews.status,
      message: reviews.message,
      dueAt: reviews.dueAt,
      createdAt: reviews.createdAt,
      requestedByName: users.name,
    })
    .from(reviews)
    .innerJoin(designRevisions, eq(designRevisions.id, reviews.revisionId))
    .innerJoin(users, eq(users.id, reviews.requestedBy))
    .where(eq(reviews.designId, designId))
    .orderBy(desc(reviews.createdAt));
  const names = rows.length
    ? await getDb()
        .select({ reviewId: reviewReviewers.reviewId, name: users.name })
        .from(reviewReviewers)
        .innerJoin(users, eq(users.id, reviewReviewers.userId))
        .where(inArray(reviewReviewers.reviewId, rows.map((r) => r.id)))
    : [];
  return rows.map((row) => ({ ...row, reviewerNames: names.filter((n) => n.reviewId === row.id).map((n) => n.name) }));
}

/**
 * Tells the people of a design's open reviews that a new revision was saved (called inside the save's transaction,
 * db/revisions.ts). Their review stays on the revision it was asked for; the page shows that a newer one exists.
 */
export async function notifyRevisionUnderReview(
  tx: Tx,
  values: { designId: string; actorId: string; number: number; message: string },
): Promise<void> {
  const open = await tx
    .select({ id: reviews.id, slug: workspaces.slug, title: designs.title })
    .from(reviews)
    .innerJoin(designs, eq(designs.id, reviews.designId))
    .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
    .where(and(eq(reviews.designId, values.designId), eq(reviews.status, "open")));
  for (const review of open) {
    await notify(tx, await reviewPeople(tx, review.id), values.actorId, {
      kind: "revision.created",
      title: `New revision r${values.number} of ${review.title}, which is under review`,
      body: `r${values.number}: ${values.message}. Remarks on parts that changed are marked outdated.`,
      link: reviewPath(review.slug, values.designId, review.id),
    });
  }
}
