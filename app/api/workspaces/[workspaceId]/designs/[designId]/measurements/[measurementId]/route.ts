import { route } from "@/app/_server/respond";
import { deleteObjectQuietly } from "@/app/_server/storage";
import { deleteMeasurement, getMeasurement } from "@/db/measurements";
import { access, type Params } from "../../../_access";

export const dynamic = "force-dynamic";

/** One measurement's parsed curve — the only form in which a measurement is ever served back. */
export const GET = route<Params<"designId" | "measurementId">>(async (_request, { params }) => {
  const { workspaceId, designId, measurementId } = await params;
  await access(workspaceId, "design.read");
  const m = await getMeasurement(workspaceId, designId, measurementId);
  return Response.json(
    { measurement: { id: m.id, name: m.name, kind: m.kind, revisionId: m.revisionId, mapping: m.mapping, data: m.data, createdAt: m.createdAt, uploadedByName: m.uploadedByName } },
    { headers: { "Cache-Control": "private, no-store", "X-Content-Type-Options": "nosniff" } },
  );
});

/** Removes the row first (so it is never listed without its file), then the stored original. */
export const DELETE = route<Params<"designId" | "measurementId">>(async (_request, { params }) => {
  const { workspaceId, designId, measurementId } = await params;
  const { user } = await access(workspaceId, "revision.create");
  const key = await deleteMeasurement(workspaceId, designId, measurementId, user.id);
  await deleteObjectQuietly(key);
  return new Response(null, { status: 204 });
});
