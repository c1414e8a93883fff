import { route } from "@/app/_server/respond";
import { accessDesign } from "@/app/_server/review-access";
import { getRevision } from "@/db/revisions";
import { getRevisionChecks, storeRevisionChecks } from "@/db/revision-checks";

export const dynamic = "force-dynamic";

type Params = { params: Promise<{ designId: string; revisionId: string }> };

/** A revision's figures and target checks, as computed on the server when it was saved. */
export const GET = route<Params>(async (_request, { params }) => {
  const { designId, revisionId } = await params;
  const { home } = await accessDesign(designId, "design.read");
  await getRevision(home.workspaceId, designId, revisionId);
  return Response.json({ checks: await getRevisionChecks(revisionId) });
});

/** Computes the checks again (after an engine update); refused with 409 once the revision is approved. */
export const POST = route<Params>(async (_request, { params }) => {
  const { designId, revisionId } = await params;
  const { home } = await accessDesign(designId, "revision.create");
  const revision = await getRevision(home.workspaceId, designId, revisionId);
  return Response.json({ checks: await storeRevisionChecks(revisionId, revision.circuit) });
});
