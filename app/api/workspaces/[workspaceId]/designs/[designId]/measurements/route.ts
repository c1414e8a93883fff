import { uploadMeasurement } from "@/app/_server/measurement-upload";
import { readUpload } from "@/app/_server/read-upload";
import { route } from "@/app/_server/respond";
import { MAX_MEASUREMENT_BYTES } from "@/components/measurements/read-table";
import { getDesign } from "@/db/designs";
import { listMeasurements } from "@/db/measurements";
import { access, type Params } from "../../_access";

export const dynamic = "force-dynamic";

/** The design's measurements (names and who uploaded them; the curves come one at a time). */
export const GET = route<Params<"designId">>(async (_request, { params }) => {
  const { workspaceId, designId } = await params;
  await access(workspaceId, "design.read");
  // an unknown or another workspace's design is 404, never an empty list that looks like a real one
  await getDesign(workspaceId, designId);
  return Response.json({ measurements: await listMeasurements(workspaceId, designId) });
});

/**
 * Upload: multipart with `file` (CSV/TSV, ≤ 2 MB), `mapping` (JSON of components/schemas/measurement.ts) and an
 * optional `revisionId`. 201 with the new id; 413/415/422 say what to fix; 503 when storage is down (nothing kept).
 */
export const POST = route<Params<"designId">>(async (request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "revision.create");
  const upload = await readUpload(request, MAX_MEASUREMENT_BYTES, "measurement file");
  const result = await uploadMeasurement({
    workspaceId,
    designId,
    userId: user.id,
    filename: upload.file.name || "measurement.csv",
    bytes: upload.bytes,
    mappingJson: upload.fields.mapping ?? "",
    revisionId: upload.fields.revisionId || null,
  });
  return Response.json({ measurement: result }, { status: 201 });
});
