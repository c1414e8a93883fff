import type { Metadata } from "next";
import { headers } from "next/headers";
import { PageLink } from "@/components/ui/page-link";
import { notFound } from "next/navigation";
import { requireWorkspacePage } from "@/app/_server/workspace-page";
import { loadReport } from "@/app/_server/sign-off/load-report";
import { can } from "@/components/auth/roles";
import { AttachReportForm } from "@/components/report/attach-report-form";
import { ReportView } from "@/components/report/report-view";
import { AppError } from "@/db/errors";
import { signOffRecord } from "@/db/sign-off";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Sign-off report" };

type Props = { params: Promise<{ slug: string; designId: string; revisionId: string }> };

/** A revision's sign-off report as a page, with the PDF download and attaching it to a review. */
export default async function ReportPage({ params }: Props) {
  const { slug, designId, revisionId } = await params;
  const here = `/w/${slug}/designs/${designId}/revisions/${revisionId}/report`;
  const { membership } = await requireWorkspacePage(slug, here);
  const host = (await headers()).get("host");
  const origin = process.env.NEXTAUTH_URL ?? (host ? `http://${host}` : "");
  try {
    const [report, record] = await Promise.all([
      loadReport(membership, designId, revisionId, { origin }),
      signOffRecord(membership.workspaceId, designId, revisionId),
    ]);
    const api = `/api/workspaces/${membership.workspaceId}/designs/${designId}/revisions/${revisionId}/report`;
    return (
      <div className="mx-auto w-full max-w-4xl px-4 py-8 sm:px-6">
        <nav aria-label="Breadcrumb" className="mb-3 text-sm text-ink-soft">
          <PageLink href={`/w/${slug}/designs/${designId}`} className="underline-offset-2 hover:underline">
            {report.title} · r{report.revisionNumber}
          </PageLink>
        </nav>
        <div className="mb-6 flex flex-wrap items-end gap-4 rounded-md border border-rule bg-paper-deep/40 p-3">
          <a href={api} className="rounded bg-brass px-3 py-1.5 text-sm font-semibold text-ink hover:bg-brass-deep hover:text-paper" download>
            Download PDF
          </a>
          {can(membership.role, "review.remark") && (
            <AttachReportForm url={`${api}/attach`} reviews={record.reviews.map((r) => ({ id: r.id, label: `Review requested ${r.createdAt.toISOString().slice(0, 10)} (${r.status})` }))} />
          )}
        </div>
        <ReportView report={report} />
      </div>
    );
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
