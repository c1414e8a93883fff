import "server-only";
/**
 * What the sign-off report reads of a revision's reviews: the reviews of that revision, every remark on it (with its
 * anchor and whether it is resolved) and every decision. Read-only; the review flow itself lives in db/reviews.ts,
 * db/remarks.ts and db/review-decisions.ts.
 */
import { and, asc, desc, eq } from "drizzle-orm";
import { getDb } from "./client";
import { decisions, designs, remarks, reviews, users } from "./schema";

export interface SignOffRemark {
  id: string;
  parentId: string | null;
  authorName: string | null;
  body: string;
  anchor: unknown;
  resolved: boolean;
  createdAt: Date;
}

export interface SignOffDecision {
  reviewerName: string | null;
  verdict: "approve" | "rework";
  reason: string;
  createdAt: Date;
}

export interface SignOffReview {
  id: string;
  status: string;
  message: string;
  createdAt: Date;
}

export async function signOffRecord(workspaceId: string, designId: string, revisionId: string) {
  const db = getDb();
  const inWorkspace = and(eq(designs.id, designId), eq(designs.workspaceId, workspaceId));
  const reviewRows: SignOffReview[] = await db
    .select({ id: reviews.id, status: reviews.status, message: reviews.message, createdAt: reviews.createdAt })
    .from(reviews)
    .innerJoin(designs, eq(designs.id, reviews.designId))
    .where(and(eq(reviews.revisionId, revisionId), inWorkspace))
    .orderBy(desc(reviews.createdAt));
  const remarkRows = await db
    .select({ id: remarks.id, parentId: remarks.parentId, authorName: users.name, body: remarks.body, anchor: remarks.anchor, resolvedAt: remarks.resolvedAt, createdAt: remarks.createdAt })
    .from(remarks)
    .innerJoin(designs, eq(designs.id, remarks.designId))
    .leftJoin(users, eq(users.id, remarks.authorId))
    .where(and(eq(remarks.revisionId, revisionId), inWorkspace))
    .orderBy(asc(remarks.createdAt));
  const decisionRows: SignOffDecision[] = await db
    .select({ reviewerName: users.name, verdict: decisions.verdict, reason: decisions.reason, createdAt: decisions.createdAt })
    .from(decisions)
    .innerJoin(reviews, eq(reviews.id, decisions.reviewId))
    .innerJoin(designs, eq(designs.id, reviews.designId))
    .leftJoin(users, eq(users.id, decisions.reviewerId))
    .where(and(eq(decisions.revisionId, revisionId), inWorkspace))
    .orderBy(asc(decisions.createdAt));
  const remarkList: SignOffRemark[] = remarkRows.map(({ resolvedAt, ...r }) => ({ ...r, resolved: resolvedAt !== null }));
  return { reviews: reviewRows, remarks: remarkList, decisions: decisionRows };
}
