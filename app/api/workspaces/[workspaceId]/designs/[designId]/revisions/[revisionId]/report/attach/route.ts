import { readJson, route } from "@/app/_server/respond";
import { loadReport } from "@/app/_server/sign-off/load-report";
import { reportFileName } from "@/app/_server/sign-off/report-file-name";
import { renderReportPdf } from "@/app/_server/sign-off/report-pdf";
import { storageKey, storeThenRecord } from "@/app/_server/store-then-record";
import { attachReportSchema } from "@/components/schemas/report";
import { AppError } from "@/db/errors";
import { assertReviewOfDesign, insertAttachment } from "@/db/attachments";
import { getRevision } from "@/db/revisions";
import { signOffRecord } from "@/db/sign-off";
import { access, type Params } from "../../../../../_access";

export const dynamic = "force-dynamic";

/** Renders the report and attaches the PDF to a review of this revision (stored through the S3 client). */
export const POST = route<Params<"designId" | "revisionId">>(async (request, { params }) => {
  const { workspaceId, designId, revisionId } = await params;
  const { user, membership } = await access(workspaceId, "review.remark");
  const input = await readJson(request, attachReportSchema);
  // The path first: an unknown or foreign design or revision is 404, as everywhere, before the body's review is judged.
  await getRevision(workspaceId, designId, revisionId);
  await assertReviewOfDesign(designId, input.reviewId);
  const { reviews } = await signOffRecord(workspaceId, designId, revisionId);
  if (!reviews.some((r) => r.id === input.reviewId)) {
    throw new AppError("invalid_input", "That review is of another revision; attach the report to a review of this one.", { fields: { reviewId: "Choose a review of this revision." } });
  }
  const report = await loadReport(membership, designId, revisionId, { destinations: input.destinations, origin: process.env.NEXTAUTH_URL ?? new URL(request.url).origin });
  const pdf = new Uint8Array(await renderReportPdf(report));
  const filename = reportFileName(report.title, report.revisionNumber);
  const key = storageKey(designId, "reports", filename);
  const row = await storeThenRecord(key, pdf, "application/pdf", () =>
    insertAttachment({ workspaceId, designId, reviewId: input.reviewId, storageKey: key, filename, contentType: "application/pdf", sizeBytes: pdf.byteLength, uploadedBy: user.id, action: "report.attach" }),
  );
  return Response.json({ attachment: { id: row.id, filename, sizeBytes: pdf.byteLength } }, { status: 201 });
});
