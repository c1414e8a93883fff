import { readJson, route } from "@/app/_server/respond";
import { createDesignSchema, listDesignsQuerySchema } from "@/components/schemas/design";
import { createDesign, getDesign, listDesignAuthors, listDesigns } from "@/db/designs";
import { checksByRevision } from "@/db/revision-checks";
import { access, type Params, SAVE_BODY_LIMIT_BYTES } from "./_access";

export const dynamic = "force-dynamic";

/** The workspace's designs: ?q=&sort=&dir=&status=&author=&page=&pageSize=&show=active|deleted */
export const GET = route<Params>(async (request, { params }) => {
  const { workspaceId } = await params;
  await access(workspaceId, "design.read");
  const query = listDesignsQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const [page, authors] = await Promise.all([listDesigns(workspaceId, query), listDesignAuthors(workspaceId)]);
  // the head revision's target checks, for the table's Targets column (absent: not computed yet)
  const checks = await checksByRevision(page.rows.flatMap((row) => (row.headRevisionId ? [row.headRevisionId] : [])));
  const rows = page.rows.map((row) => {
    const c = row.headRevisionId ? checks.get(row.headRevisionId) : undefined;
    return { ...row, checksAllPass: c ? c.allPass : undefined, checksMissed: c ? c.checks.filter((k) => !k.pass).length : undefined };
  });
  return Response.json({ ...page, rows, authors });
});

/** A new design: { title, description?, circuit? (omitted: the empty starting circuit), message? } */
export const POST = route<Params>(async (request, { params }) => {
  const { workspaceId } = await params;
  const { user } = await access(workspaceId, "design.create");
  const input = await readJson(request, createDesignSchema, SAVE_BODY_LIMIT_BYTES);
  const created = await createDesign(workspaceId, user.id, input);
  return Response.json({ design: await getDesign(workspaceId, created.designId), revisionId: created.revisionId }, { status: 201 });
});
