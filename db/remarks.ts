import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { anchorLabel, isRemarkOutdated } from "@/components/reviews/remark-outdated";
import type { CreateRemarkInput, RemarkAnchor } from "@/components/schemas/review";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { assertId } from "./designs";
import { AppError } from "./errors";
import { notify } from "./notifications";
import { reviewPath, reviewPeople } from "./reviews";
import { designRevisions, designs, remarks, reviews, users, workspaces } from "./schema";

/** "Part COUT" → "part COUT" inside a sentence; part ids, nets and units keep their case. */
const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);

/**
 * Remarks and their threads. A remark belongs to the revision its review is about; replies point at the thread's
 * first remark and share its anchor. Resolving and reopening act on the thread (its first remark).
 */
export async function addRemark(reviewId: string, actor: { id: string; name: string | null }, input: CreateRemarkInput): Promise<{ id: string }> {
  return getDb().transaction(async (tx) => {
    const [review] = await tx
      .select({ id: reviews.id, designId: reviews.designId, revisionId: reviews.revisionId, workspaceId: designs.workspaceId, slug: workspaces.slug, title: designs.title })
      .from(reviews)
      .innerJoin(designs, eq(designs.id, reviews.designId))
      .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
      .where(eq(reviews.id, reviewId));
    if (!review) throw new AppError("not_found", "No such review.");
    let anchor: RemarkAnchor;
    let parentId: string | null = null;
    const people = await reviewPeople(tx, reviewId);
    if ("parentId" in input) {
      assertId(input.parentId, "remark");
      const [parent] = await tx.select().from(remarks).where(and(eq(remarks.id, input.parentId), eq(remarks.designId, review.designId)));
      if (!parent) throw new AppError("not_found", "The remark you reply to does not exist (it may have been removed).", { fields: { parentId: "Reply to a remark on this design." } });
      // a reply to a reply joins the same thread
      parentId = parent.parentId ?? parent.id;
      const thread = await tx.select({ authorId: remarks.authorId, anchor: remarks.anchor }).from(remarks).where(inArray(remarks.id, [parentId]));
      anchor = thread[0].anchor as RemarkAnchor;
      const repliers = await tx.select({ authorId: remarks.authorId }).from(remarks).where(eq(remarks.parentId, parentId));
      people.push(thread[0].authorId, ...repliers.map((r) => r.authorId));
    } else {
      anchor = input.anchor;
    }
    const [remark] = await tx
      .insert(remarks)
      .values({ designId: review.designId, revisionId: review.revisionId, reviewId, parentId, authorId: actor.id, body: input.body.trim(), anchor })
      .returning({ id: remarks.id });
    await recordAudit(tx, {
      workspaceId: review.workspaceId,
      actorId: actor.id,
      action: parentId ? "remark.reply" : "remark.create",
      targetType: "remark",
      targetId: remark.id,
      detail: { reviewId, anchor },
    });
    const where = lowerFirst(anchorLabel(anchor));
    await notify(tx, people, actor.id, {
      kind: parentId ? "remark.replied" : "remark.created",
      title: parentId ? `${actor.name ?? "Someone"} replied about ${where} on ${review.title}` : `${actor.name ?? "Someone"} remarked on ${where} of ${review.title}`,
      body: input.body.trim().slice(0, 600),
      link: `${reviewPath(review.slug, review.designId, reviewId)}#remark-${parentId ?? remark.id}`,
    });
    return remark;
  });
}

/** Resolves or reopens a thread (by any of its remarks' ids), telling the thread and the review's people. */
export async function setRemarkResolved(remarkId: string, actor: { id: string; name: string | null }, resolved: boolean): Promise<void> {
  assertId(remarkId, "remark");
  await getDb().transaction(async (tx) => {
    const [found] = await tx.select({ id: remarks.id, parentId: remarks.parentId }).from(remarks).where(eq(remarks.id, remarkId));
    if (!found) throw new AppError("not_found", "No such remark.");
    const rootId = found.parentId ?? found.id;
    const [root] = await tx
      .select({
        id: remarks.id,
        authorId: remarks.authorId,
        anchor: remarks.anchor,
        reviewId: remarks.reviewId,
        designId: remarks.designId,
        resolvedAt: remarks.resolvedAt,
        workspaceId: designs.workspaceId,
        slug: workspaces.slug,
        title: designs.title,
      })
      .from(remarks)
      .innerJoin(designs, eq(designs.id, remarks.designId))
      .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
      .where(eq(remarks.id, rootId))
      .for("update", { of: remarks });
    if (Boolean(root.resolvedAt) === resolved) return; // already so: nothing to tell anyone
    await tx
      .update(remarks)
      .set(resolved ? { resolvedAt: new Date(), resolvedBy: actor.id } : { resolvedAt: null, resolvedBy: null })
      .where(eq(remarks.id, rootId));
    await recordAudit(tx, {
      workspaceId: root.workspaceId,
      actorId: actor.id,
      action: resolved ? "remark.resolve" : "remark.reopen",
      targetType: "remark",
      targetId: rootId,
      detail: {},
    });
    const people = root.reviewId ? await reviewPeople(tx, root.reviewId) : [];
    const repliers = await tx.select({ authorId: remarks.authorId }).from(remarks).where(eq(remarks.parentId, rootId));
    const where = lowerFirst(anchorLabel(root.anchor as RemarkAnchor));
    await notify(tx, [root.authorId, ...people, ...repliers.map((r) => r.authorId)], actor.id, {
      kind: "remark.resolved",
      title: `${actor.name ?? "Someone"} ${resolved ? "resolved" : "reopened"} the remark on ${where} of ${root.title}`,
      body: "",
      link: root.reviewId ? `${reviewPath(root.slug, root.designId, root.reviewId)}#remark-${rootId}` : `/w/${root.slug}/designs/${root.designId}`,
    });
  });
}

/** The workspace a remark belongs to (routes addressed by remark id). */
export async function remarkHome(remarkId: string) {
  assertId(remarkId, "remark");
  const [row] = await getDb()
    .select({ workspaceId: designs.workspaceId })
    .from(remarks)
    .innerJoin(designs, eq(designs.id, remarks.designId))
    .where(eq(remarks.id, remarkId));
  if (!row) throw new AppError("not_found", "No such remark, or you are not a member of its workspace.");
  return row;
}

export interface RemarkView {
  id: string;
  body: string;
  authorId: string;
  authorName: string | null;
  createdAt: Date;
}

export interface RemarkThread extends RemarkView {
  anchor: RemarkAnchor;
  reviewId: string | null;
  revisionId: string;
  revisionNumber: number;
  resolvedAt: Date | null;
  resolvedByName: string | null;
  /** its part or net changed between the revision it was made on and `comparedWith` */
  outdated: boolean;
  replies: RemarkView[];
}

const resolver = alias(users, "resolver");

/**
 * Every thread on a design, oldest first, each marked outdated against `current` (the revision shown, usually the
 * design's head) when what it is anchored to changed since the revision it was made on.
 */
export async function listThreads(designId: string, current: { id: string; circuit: unknown } | null): Promise<RemarkThread[]> {
  const rows = await getDb()
    .select({
      id: remarks.id,
      parentId: remarks.parentId,
      body: remarks.body,
      authorId: remarks.authorId,
      authorName: users.name,
      createdAt: remarks.createdAt,
      anchor: remarks.anchor,
      reviewId: remarks.reviewId,
      revisionId: remarks.revisionId,
      revisionNumber: designRevisions.number,
      resolvedAt: remarks.resolvedAt,
      resolvedByName: resolver.name,
    })
    .from(remarks)
    .innerJoin(users, eq(users.id, remarks.authorId))
    .innerJoin(designRevisions, eq(designRevisions.id, remarks.revisionId))
    .leftJoin(resolver, eq(resolver.id, remarks.resolvedBy))
    .where(eq(remarks.designId, designId))
    .orderBy(asc(remarks.createdAt), asc(remarks.id));
  const revisionIds = [...new Set(rows.filter((r) => !r.parentId && r.revisionId !== current?.id).map((r) => r.revisionId))];
  const circuits = new Map<string, unknown>();
  if (current && revisionIds.length > 0) {
    const found = await getDb().select({ id: designRevisions.id, circuit: designRevisions.circuit }).from(designRevisions).where(inArray(designRevisions.id, revisionIds));
    for (const row of found) circuits.set(row.id, row.circuit);
  }
  const threads: RemarkThread[] = [];
  const byId = new Map<string, RemarkThread>();
  for (const row of rows) {
    const view: RemarkView = { id: row.id, body: row.body, authorId: row.authorId, authorName: row.authorName, createdAt: row.createdAt };
    if (row.parentId) {
      byId.get(row.parentId)?.replies.push(view);
      continue;
    }
    const anchor = row.anchor as RemarkAnchor;
    const madeOn = circuits.get(row.revisionId);
    const thread: RemarkThread = {
      ...view,
      anchor,
      reviewId: row.reviewId,
      revisionId: row.revisionId,
      revisionNumber: row.revisionNumber,
      resolvedAt: row.resolvedAt,
      resolvedByName: row.resolvedByName,
      outdated: Boolean(current && madeOn !== undefined && isRemarkOutdated(anchor, madeOn, current.circuit)),
      replies: [],
    };
    threads.push(thread);
    byId.set(row.id, thread);
  }
  return threads;
}
