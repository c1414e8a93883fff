import type { Metadata } from "next";
import { PageLink } from "@/components/ui/page-link";
import { notFound } from "next/navigation";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { AttachmentsPanel } from "@/components/attachments/attachments-panel";
import { can } from "@/components/auth/roles";
import { BenchLinksPanel } from "@/components/designs/bench-links-panel";
import { diffCircuits } from "@/components/designs/circuit-diff";
import { CircuitDiffView } from "@/components/designs/circuit-diff-view";
import { DesignActions, ForkPanel } from "@/components/designs/design-actions";
import { formatTime } from "@/components/designs/format-time";
import { Panel } from "@/components/designs/panel";
import { RestoreRevisionButton } from "@/components/designs/restore-revision-button";
import { RevisionReadout } from "@/components/designs/revision-readout";
import { runSavedRevision } from "@/app/_server/revision-runs";
import { SaveRevisionForm } from "@/components/designs/save-revision-form";
import { StatusBadge } from "@/components/designs/status-badge";
import { getDesign } from "@/db/designs";
import { AppError } from "@/db/errors";
import { getRevision, listRevisions } from "@/db/revisions";
import { DesignReviewPanels } from "./design-review-panels";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Design" };

type Props = { params: Promise<{ slug: string; designId: string }>; searchParams: Promise<{ r?: string }> };

async function loadDesign(workspaceId: string, designId: string) {
  try {
    return await getDesign(workspaceId, designId, { includeDeleted: true });
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}

/** A design's overview: latest figures, history with what changed, and the actions the person's role allows. */
export default async function DesignPage({ params, searchParams }: Props) {
  const { slug, designId } = await params;
  const { r } = await searchParams;
  const { user, membership } = await requireWorkspacePage(slug, `/w/${slug}/designs/${designId}`);
  const { workspaceId, role } = membership;
  const design = await loadDesign(workspaceId, designId);
  const deleted = Boolean(design.deletedAt);
  const revisions = deleted ? [] : await listRevisions(workspaceId, designId);
  const head = design.headRevisionId ? await getRevision(workspaceId, designId, design.headRevisionId, { includeDeletedDesign: true }) : null;
  const selectedSummary = revisions.find((rev) => rev.id === r) ?? revisions[0];
  const selected = selectedSummary && head && selectedSummary.id !== head.id ? await getRevision(workspaceId, designId, selectedSummary.id) : head;
  const parent = selected?.parentId ? await getRevision(workspaceId, designId, selected.parentId) : null;
  const run = head ? runSavedRevision(head.id, head.circuit) : null;
  const variants = Array.isArray(head?.circuit.variants)
    ? (head.circuit.variants as { name?: unknown }[]).map((v) => String(v.name ?? "")).filter(Boolean)
    : [];
  const exportUrl = (id: string) => `/api/workspaces/${workspaceId}/designs/${designId}/revisions/${id}/export`;

  return (
    <div className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6">
      <nav aria-label="Breadcrumb" className="mb-3 text-sm text-ink-soft">
        <PageLink href={`/w/${slug}`} className="underline-offset-2 hover:underline">
          {membership.name} · Designs
        </PageLink>
      </nav>
      <header className="mb-6 space-y-2 border-b border-rule pb-4">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="min-w-0 break-words text-2xl font-bold text-ink sm:text-3xl">{design.title}</h1>
          <StatusBadge status={design.status} />
        </div>
        {!deleted ? (
          <PageLink href={`/w/${slug}/designs/${designId}/bench`} className="inline-block rounded bg-graphite px-3 py-1.5 text-sm font-semibold text-paper hover:bg-ink">
            {can(role, "revision.create") ? "Open the bench" : "Open the bench (read-only)"}
          </PageLink>
        ) : null}
        <p className="text-sm text-ink-soft">
          {head ? (
            <>
              Latest <span className="font-mono">r{head.number}</span> by {head.authorName ?? "—"}, {formatTime(head.createdAt)} · created by{" "}
              {design.createdByName ?? "—"}
            </>
          ) : (
            "No revision yet."
          )}
          {head ? (
            <>
              {" · "}
              <a href={exportUrl(head.id)} className="underline" download>
                Export r{head.number}
              </a>
            </>
          ) : null}
        </p>
        {deleted ? (
          <p role="status" className="rounded-md border border-caution/40 bg-caution-bg px-3 py-2 text-sm text-caution">
            This design was deleted on {formatTime(design.deletedAt!)}. It is hidden from the table until it is restored.
          </p>
        ) : null}
        {!can(role, "revision.create") ? (
          <p className="text-sm text-ink-soft">You are a {role} here: you can read this design; saving is for designers and owners.</p>
        ) : null}
      </header>

      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-6">
          {head && run ? <RevisionReadout run={run} circuit={head.circuit} /> : null}
        </div>
        <aside className="min-w-0 space-y-6">
          {!deleted ? (
            <Panel title="History">
              <ol className="divide-y divide-rule text-sm" aria-label="Revisions, newest first">
                {revisions.map((rev) => (
                  <li key={rev.id} className={`flex items-start justify-between gap-2 py-2 ${rev.id === selected?.id ? "bg-brass-light/20" : ""}`}>
                    <PageLink href={`?r=${rev.id}`} scroll={false} className="min-w-0 flex-1">
                      <span className="font-mono font-semibold">r{rev.number}</span> <span className="break-words">{rev.message}</span>
                      <span className="block text-xs text-ink-soft">
                        {rev.authorName ?? "—"} · {formatTime(rev.createdAt)}
                      </span>
                    </PageLink>
                    <span className="flex shrink-0 flex-col items-end gap-1">
                      <a href={exportUrl(rev.id)} className="text-xs underline" download>
                        Export
                      </a>
                      <PageLink href={`/w/${slug}/designs/${designId}/revisions/${rev.id}/report`} className="text-xs underline">
                        Sign-off report
                      </PageLink>
                      {can(role, "revision.create") && head && rev.id !== head.id ? (
                        <RestoreRevisionButton workspaceId={workspaceId} designId={designId} revisionId={rev.id} number={rev.number} headRevisionId={head.id} />
                      ) : null}
                    </span>
                  </li>
                ))}
              </ol>
            </Panel>
          ) : null}
          {head && !deleted ? (
            <DesignReviewPanels slug={slug} membership={membership} userId={user.id} designId={designId} head={head} revisions={revisions} variants={variants} />
          ) : null}
          {!deleted ? (
            <Panel title="Attachments">
              <AttachmentsPanel workspaceId={workspaceId} designId={designId} role={role} userId={user.id} canUpload={can(role, "review.remark")} />
            </Panel>
          ) : null}
          {selected ? (
            <Panel title={`What changed in r${selected.number}`}>
              <CircuitDiffView diff={diffCircuits(parent?.circuit ?? null, selected.circuit)} parentNumber={parent?.number ?? null} />
            </Panel>
          ) : null}
          {can(role, "revision.create") && !deleted ? (
            <Panel title="Save a revision">
              <SaveRevisionForm workspaceId={workspaceId} designId={designId} headRevisionId={design.headRevisionId} />
            </Panel>
          ) : null}
          {can(role, "design.edit") || can(role, "design.delete") ? (
            <Panel title="Design">
              <DesignActions
                workspaceId={workspaceId}
                slug={slug}
                designId={designId}
                title={design.title}
                deleted={deleted}
                canEdit={can(role, "design.edit")}
                canDelete={can(role, "design.delete")}
              />
            </Panel>
          ) : null}
          {!deleted ? <ForkPanel workspaceId={workspaceId} designId={designId} /> : null}
          {can(role, "share.manage") && !deleted ? (
            <Panel title="Bench links">
              <BenchLinksPanel
                workspaceId={workspaceId}
                designId={designId}
                revisions={revisions.map((rev) => ({ id: rev.id, number: rev.number }))}
                variants={variants}
                allowPublicLinks={membership.allowPublicLinks}
              />
            </Panel>
          ) : null}
        </aside>
      </div>
    </div>
  );
}
