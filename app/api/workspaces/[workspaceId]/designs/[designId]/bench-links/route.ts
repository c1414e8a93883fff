import { readJson, route } from "@/app/_server/respond";
import { createBenchLinkSchema } from "@/components/schemas/design-bench-link";
import { createShareLink, listShareLinks } from "@/db/share-links";
import { access, type Params } from "../../_access";

export const dynamic = "force-dynamic";

export const GET = route<Params<"designId">>(async (_request, { params }) => {
  const { workspaceId, designId } = await params;
  await access(workspaceId, "share.manage");
  return Response.json({ links: await listShareLinks(workspaceId, designId) });
});

/** Creates a bench link; the token (and so the /b/<token> address) is in this response only. */
export const POST = route<Params<"designId">>(async (request, { params }) => {
  const { workspaceId, designId } = await params;
  const { user } = await access(workspaceId, "share.manage");
  const input = await readJson(request, createBenchLinkSchema);
  const { token, link } = await createShareLink(workspaceId, designId, user.id, input);
  return Response.json({ token, path: `/b/${token}`, link }, { status: 201 });
});
