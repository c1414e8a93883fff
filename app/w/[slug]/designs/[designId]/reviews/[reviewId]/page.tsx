import type { Metadata } from "next";
import { PageLink } from "@/components/ui/page-link";
import { notFound } from "next/navigation";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { AttachmentsPanel } from "@/components/attachments/attachments-panel";
import { can } from "@/components/auth/roles";
import { formatTime } from "@/components/designs/format-time";
import { StatusBadge } from "@/components/designs/status-badge";
import { ChecksBadge, ChecksTable, figureLabel, formatFigure } from "@/components/reviews/checks-panel";
import { DecisionForm } from "@/components/reviews/decision-form";
import { NewRemarkForm } from "@/components/reviews/new-remark-form";
import { anchorKey, anchorLabel } from "@/components/reviews/remark-outdated";
import { RemarkThread, type ThreadView } from "@/components/reviews/remark-thread";
import { decideRefusal } from "@/components/reviews/review-rules";
import type { DesignStatus } from "@/components/schemas/design";
import { TARGET_FIGURES } from "@/components/schemas/targets";
import { AppError } from "@/db/errors";
import { getReviewDetail, type ReviewDetail } from "@/db/review-detail";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Review" };

type Props = { params: Promise<{ slug: string; designId: string; reviewId: string }> };

const REVIEW_STATUS_WORDS = { open: "Open", approved: "Approved", rework: "Rework asked", withdrawn: "Withdrawn" } as const;

function Panel({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section aria-label={title} className="space-y-3 rounded-md border border-rule bg-paper p-4">
      <h2 className="font-display text-base font-semibold">{title}</h2>
      {children}
    </section>
  );
}

async function load(workspaceId: string, reviewId: string, designId: string): Promise<ReviewDetail> {
  try {
    const detail = await getReviewDetail(workspaceId, reviewId);
    if (detail.designId !== designId) notFound();
    return detail;
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}

function circuitNames(circuit: Record<string, unknown>) {
  const parts = Array.isArray(circuit.parts) ? (circuit.parts as { id?: unknown; pins?: Record<string, unknown> }[]) : [];
  const nets = new Set<string>();
  for (const part of parts) for (const net of Object.values(part.pins ?? {})) nets.add(String(net));
  return { parts: parts.map((p) => String(p.id)), nets: [...nets].sort() };
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** One review: the revision and its checks, who was asked and what they decided, and the remarks by anchor. */
export default async function ReviewPage({ params }: Props) {
  const { slug, designId, reviewId } = await params;
  const { user, membership } = await requireWorkspacePage(slug, `/w/${slug}/designs/${designId}/reviews/${reviewId}`, "design.read");
  const review = await load(membership.workspaceId, reviewId, designId);
  const canRemark = can(membership.role, "review.remark");
  const mayDecide =
    review.status === "open" &&
    (decideRefusal("rework", {
      role: membership.role,
      allowSelfApproval: membership.allowSelfApproval,
      isRequestedReviewer: review.reviewers.some((r) => r.id === user.id),
      isAuthor: review.revision.authorId === user.id,
    }) === null);
  const benchPath = `/w/${slug}/designs/${designId}/bench`;
  const { parts, nets } = circuitNames(review.revision.circuit);
  const groups = new Map<string, { label: string; threads: ThreadView[] }>();
  for (const t of review.threads) {
    const key = anchorKey(t.anchor);
    if (!groups.has(key)) groups.set(key, { label: anchorLabel(t.anchor), threads: [] });
    groups.get(key)?.threads.push({
      ...t,
      createdAt: t.createdAt.toISOString(),
      resolvedAt: iso(t.resolvedAt),
      replies: t.replies.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() })),
    });
  }
  const figures = Object.keys(TARGET_FIGURES).filter((f) => f in review.checks.figures);
  const newer = review.head && review.head.id !== review.revision.id ? review.head : null;

  return (
    <div className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6">
      <nav aria-label="Breadcrumb" className="mb-3 text-sm text-ink-soft">
        <PageLink href={`/w/${slug}`} className="underline-offset-2 hover:underline">
          {membership.name}
        </PageLink>{" "}
        ·{" "}
        <PageLink href={`/w/${slug}/designs/${designId}`} className="underline-offset-2 hover:underline">
          {review.designTitle}
        </PageLink>{" "}
        · Review
      </nav>
      <header className="mb-6 space-y-2 border-b border-rule pb-4">
        <p className="font-mono text-xs uppercase tracking-[0.2em] text-brass-deep">Review of r{review.revision.number}</p>
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="min-w-0 break-words text-2xl font-bold text-ink sm:text-3xl">{review.designTitle}</h1>
          <StatusBadge status={review.designStatus as DesignStatus} />
          <ChecksBadge allPass={review.checks.allPass} checks={review.checks.checks} />
        </div>
        <p className="text-sm text-ink-soft">
          {REVIEW_STATUS_WORDS[review.status]} · asked by {review.requestedBy.name ?? "—"} {formatTime(review.createdAt)}
          {review.dueAt ? ` · due ${review.dueAt.toISOString().slice(0, 10)}` : ""}
        </p>
        {review.message ? <p className="max-w-3xl whitespace-pre-wrap break-words text-ink">{review.message}</p> : null}
        {newer ? (
          <p role="status" className="rounded-md border border-brass/40 bg-brass-light/30 px-3 py-2 text-sm text-ink">
            r{newer.number} was saved after this review was asked for. Remarks on parts that changed since are marked outdated.
          </p>
        ) : null}
      </header>

      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-6">
          <Panel title={`r${review.revision.number}: ${review.revision.message}`}>
            <p className="text-sm text-ink-soft">
              Saved by {review.revision.authorName ?? "—"}, {formatTime(review.revision.createdAt)} ·{" "}
              <PageLink href={benchPath} className="text-brass-deep underline underline-offset-2">
                Open the bench
              </PageLink>
            </p>
            <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2" aria-label="Figures">
              {figures.map((f) => (
                <div key={f} className="flex justify-between gap-3 border-b border-rule/60 py-1">
                  <dt className="text-ink-soft">{figureLabel(f)}</dt>
                  <dd className="font-mono">{formatFigure(review.checks.figures[f], f)}</dd>
                </div>
              ))}
            </dl>
            <h3 className="pt-2 text-sm font-semibold">Targets</h3>
            <ChecksTable checks={review.checks.checks} error={review.checks.error} />
          </Panel>
          <Panel title="Remarks">
            {groups.size === 0 ? <p className="text-sm text-ink-soft">No remarks yet.</p> : null}
            {[...groups.entries()].map(([key, group]) => (
              <section key={key} aria-label={group.label} className="space-y-2">
                <h3 className="font-mono text-xs uppercase tracking-wide text-brass-deep">{group.label}</h3>
                {group.threads.map((t) => (
                  <RemarkThread key={t.id} thread={t} reviewId={review.id} benchPath={benchPath} canRemark={canRemark} />
                ))}
              </section>
            ))}
          </Panel>
        </div>
        <aside className="min-w-0 space-y-6">
          <Panel title="Reviewers">
            <ul className="divide-y divide-rule text-sm">
              {review.reviewers.map((r) => (
                <li key={r.id} className="py-2">
                  <div className="flex items-center justify-between gap-2">
                    <span className="min-w-0 truncate font-medium">{r.name ?? r.email}</span>
                    <span className={`shrink-0 text-xs font-medium ${r.verdict === "approve" ? "text-trace" : r.verdict === "rework" ? "text-caution" : "text-ink-soft"}`}>
                      {r.verdict === "approve" ? "Approved" : r.verdict === "rework" ? "Rework" : "Not yet decided"}
                    </span>
                  </div>
                  {r.reason ? <p className="mt-1 whitespace-pre-wrap break-words text-ink-soft">{r.reason}</p> : null}
                </li>
              ))}
            </ul>
          </Panel>
          {mayDecide ? (
            <Panel title="Your decision">
              <DecisionForm reviewId={review.id} />
            </Panel>
          ) : null}
          <Panel title="Attachments">
            <AttachmentsPanel
              workspaceId={membership.workspaceId}
              designId={designId}
              reviewId={review.id}
              role={membership.role}
              userId={user.id}
              canUpload={canRemark}
            />
          </Panel>
          {canRemark ? (
            <Panel title="Add a remark">
              <NewRemarkForm reviewId={review.id} parts={parts} nets={nets} figures={Object.keys(TARGET_FIGURES)} />
            </Panel>
          ) : (
            <p className="text-sm text-ink-soft">You are a {membership.role} here: you can read this review; remarks and decisions are for reviewers.</p>
          )}
        </aside>
      </div>
    </div>
  );
}
