import type { Metadata } from "next";
import { PageLink } from "@/components/ui/page-link";
import { notFound } from "next/navigation";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { can } from "@/components/auth/roles";
import { Bench } from "@/components/bench/bench";
import { emptyCircuit } from "@/components/designs/empty-circuit";
import { getDesign } from "@/db/designs";
import { AppError } from "@/db/errors";
import { getRevision } from "@/db/revisions";
import { BenchChecks } from "./bench-checks";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Bench" };

type Props = { params: Promise<{ slug: string; designId: string }> };

/**
 * The bench of a design: its head revision, editable for roles that may save revisions and read-only for the
 * others (viewers, reviewers), with the live simulation either way.
 */
export default async function BenchPage({ params }: Props) {
  const { slug, designId } = await params;
  const { membership } = await requireWorkspacePage(slug, `/w/${slug}/designs/${designId}/bench`, "design.read");
  const { workspaceId, role } = membership;
  try {
    const design = await getDesign(workspaceId, designId);
    const head = design.headRevisionId ? await getRevision(workspaceId, designId, design.headRevisionId) : null;
    const readOnly = !can(role, "revision.create");
    return (
      <div className="w-full">
        <nav aria-label="Breadcrumb" className="truncate border-b border-rule px-3 py-1.5 text-xs text-ink-soft">
          <PageLink href={`/w/${slug}`} className="hover:underline">
            {membership.name}
          </PageLink>{" "}
          ·{" "}
          <PageLink href={`/w/${slug}/designs/${designId}`} className="hover:underline">
            {design.title}
          </PageLink>{" "}
          · Bench
          {head ? <BenchChecks revisionId={head.id} designPath={`/w/${slug}/designs/${designId}`} /> : null}
        </nav>
        <Bench
          circuit={head?.circuit ?? emptyCircuit(design.title)}
          layout={head?.layout}
          readOnly={readOnly}
          workspaceId={workspaceId}
          designId={designId}
          revision={head ? { id: head.id, number: head.number } : null}
        />
      </div>
    );
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
