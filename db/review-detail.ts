import "server-only";
import { asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { getDb } from "./client";
import { AppError } from "./errors";
import { listThreads, type RemarkThread } from "./remarks";
import { getRevisionChecks, type RevisionChecks } from "./revision-checks";
import { decisions, designRevisions, designs, reviewReviewers, reviews, users } from "./schema";

export interface ReviewerState {
  id: string;
  name: string | null;
  email: string;
  verdict: "approve" | "rework" | null;
  reason: string | null;
  decidedAt: Date | null;
}

export interface ReviewDetail {
  id: string;
  designId: string;
  designTitle: string;
  designStatus: string;
  status: "open" | "approved" | "rework" | "withdrawn";
  message: string;
  dueAt: Date | null;
  createdAt: Date;
  closedAt: Date | null;
  requestedBy: { id: string; name: string | null };
  revision: { id: string; number: number; message: string; authorId: string; authorName: string | null; createdAt: Date; circuit: Record<string, unknown> };
  head: { id: string; number: number } | null;
  checks: RevisionChecks;
  reviewers: ReviewerState[];
  decisions: { id: string; reviewerName: string | null; verdict: "approve" | "rework"; reason: string; createdAt: Date }[];
  threads: RemarkThread[];
}

const requester = alias(users, "requester");
const author = alias(users, "author");

/** Everything the review page shows; the review must belong to the workspace (else 404). */
export async function getReviewDetail(workspaceId: string, reviewId: string): Promise<ReviewDetail> {
  const [row] = await getDb()
    .select({
      id: reviews.id,
      designId: reviews.designId,
      designTitle: designs.title,
      designStatus: designs.status,
      workspaceId: designs.workspaceId,
      headRevisionId: designs.headRevisionId,
      status: reviews.status,
      message: reviews.message,
      dueAt: reviews.dueAt,
      createdAt: reviews.createdAt,
      closedAt: reviews.closedAt,
      requestedById: reviews.requestedBy,
      requestedByName: requester.name,
      revisionId: designRevisions.id,
      revisionNumber: designRevisions.number,
      revisionMessage: designRevisions.message,
      revisionAuthorId: designRevisions.authorId,
      revisionAuthorName: author.name,
      revisionCreatedAt: designRevisions.createdAt,
      circuit: designRevisions.circuit,
    })
    .from(reviews)
    .innerJoin(designs, eq(designs.id, reviews.designId))
    .innerJoin(designRevisions, eq(designRevisions.id, reviews.revisionId))
    .innerJoin(requester, eq(requester.id, reviews.requestedBy))
    .innerJoin(author, eq(author.id, designRevisions.authorId))
    .where(eq(reviews.id, reviewId));
  if (!row || row.workspaceId !== workspaceId) throw new AppError("not_found", "No such review in this workspace.");
  const head = row.headRevisionId
    ? (await getDb().select({ id: designRevisions.id, number: designRevisions.number, circuit: designRevisions.circuit }).from(designRevisions).where(eq(designRevisions.id, row.headRevisionId)))[0]
    : undefined;
  const [asked, made, threads, checks] = await Promise.all([
    getDb()
      .select({ id: users.id, name: users.name, email: users.email })
      .from(reviewReviewers)
      .innerJoin(users, eq(users.id, reviewReviewers.userId))
      .where(eq(reviewReviewers.reviewId, reviewId))
      .orderBy(asc(users.name)),
    getDb()
      .select({ id: decisions.id, reviewerId: decisions.reviewerId, reviewerName: users.name, verdict: decisions.verdict, reason: decisions.reason, createdAt: decisions.createdAt })
      .from(decisions)
      .innerJoin(users, eq(users.id, decisions.reviewerId))
      .where(eq(decisions.reviewId, reviewId))
      .orderBy(asc(decisions.createdAt)),
    listThreads(row.designId, head ? { id: head.id, circuit: head.circuit } : null),
    getRevisionChecks(row.revisionId),
  ]);
  const reviewers: ReviewerState[] = asked.map((person) => {
    const last = made.filter((d) => d.reviewerId === person.id).at(-1);
    return { ...person, verdict: last?.verdict ?? null, reason: last?.reason ?? null, decidedAt: last?.createdAt ?? null };
  });
  return {
    id: row.id,
    designId: row.designId,
    designTitle: row.designTitle,
    designStatus: row.designStatus,
    status: row.status,
    message: row.message,
    dueAt: row.dueAt,
    createdAt: row.createdAt,
    closedAt: row.closedAt,
    requestedBy: { id: row.requestedById, name: row.requestedByName },
    revision: {
      id: row.revisionId,
      number: row.revisionNumber,
      message: row.revisionMessage,
      authorId: row.revisionAuthorId,
      authorName: row.revisionAuthorName,
      createdAt: row.revisionCreatedAt,
      circuit: row.circuit as Record<string, unknown>,
    },
    head: head ? { id: head.id, number: head.number } : null,
    checks,
    reviewers,
    decisions: made.map(({ reviewerId: _r, ...d }) => d),
    threads,
  };
}
