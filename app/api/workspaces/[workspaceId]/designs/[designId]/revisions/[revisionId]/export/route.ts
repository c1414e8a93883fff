import { route } from "@/app/_server/respond";
import { exportFileName } from "@/components/designs/export-file-name";
import { getDesign } from "@/db/designs";
import { getRevision } from "@/db/revisions";
import { access, type Params } from "../../../../_access";

export const dynamic = "force-dynamic";

/** The revision's circuit file as a download named "<title>-r<n>.json". */
export const GET = route<Params<"designId" | "revisionId">>(async (_request, { params }) => {
  const { workspaceId, designId, revisionId } = await params;
  await access(workspaceId, "design.read");
  const [design, revision] = await Promise.all([getDesign(workspaceId, designId), getRevision(workspaceId, designId, revisionId)]);
  const { ascii, utf8 } = exportFileName(design.title, revision.number);
  return new Response(`${JSON.stringify(revision.circuit, null, 2)}\n`, {
    headers: {
      "Content-Type": "application/json; charset=utf-8",
      "Content-Disposition": `attachment; filename="${ascii}"; filename*=UTF-8''${utf8}`,
      "Cache-Control": "private, no-store",
    },
  });
});
