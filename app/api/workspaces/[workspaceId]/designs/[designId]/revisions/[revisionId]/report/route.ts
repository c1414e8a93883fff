import { route } from "@/app/_server/respond";
import { loadReport } from "@/app/_server/sign-off/load-report";
import { reportFileName } from "@/app/_server/sign-off/report-file-name";
import { renderReportPdf } from "@/app/_server/sign-off/report-pdf";
import { access, type Params } from "../../../../_access";

export const dynamic = "force-dynamic";

/** The revision's sign-off report as a PDF download; `?destinations=a,b` picks the destinations drawn. */
export const GET = route<Params<"designId" | "revisionId">>(async (request, { params }) => {
  const { workspaceId, designId, revisionId } = await params;
  const { membership } = await access(workspaceId, "design.read");
  const url = new URL(request.url);
  const destinations = url.searchParams.get("destinations")?.split(",").filter(Boolean);
  const report = await loadReport(membership, designId, revisionId, { destinations, origin: process.env.NEXTAUTH_URL ?? url.origin });
  const pdf = await renderReportPdf(report);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `attachment; filename="${reportFileName(report.title, report.revisionNumber)}"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, no-store",
    },
  });
});
