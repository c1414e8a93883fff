import { readJson, route } from "@/app/_server/respond";
import { circuitObjectSchema, designTitleSchema, importDesignQuerySchema, MAX_CIRCUIT_BYTES } from "@/components/schemas/design";
import { createDesign, getDesign } from "@/db/designs";
import { access, type Params } from "../_access";

export const dynamic = "force-dynamic";

/**
 * Imports a circuit file as a new design: the body is the file itself (JSON); the title comes from ?title= or the
 * file's own title. Bad files are refused with the engine's message and nothing is stored.
 */
export const POST = route<Params>(async (request, { params }) => {
  const { workspaceId } = await params;
  const { user } = await access(workspaceId, "design.create");
  // the query first, so a bad ?title= is refused by name before the file is read
  const query = importDesignQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const circuit = await readJson(request, circuitObjectSchema, MAX_CIRCUIT_BYTES);
  const fromFile = typeof circuit.title === "string" && circuit.title.trim() ? circuit.title.slice(0, 120) : "Imported circuit";
  const title = query.title ?? designTitleSchema.parse(fromFile);
  const created = await createDesign(workspaceId, user.id, { title, circuit, message: "Imported circuit file" });
  return Response.json({ design: await getDesign(workspaceId, created.designId), revisionId: created.revisionId }, { status: 201 });
});
