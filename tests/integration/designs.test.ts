import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getPool } from "@/db/client";
import { createDesign, deleteDesign, getDesign, listDesignAuthors, listDesigns, renameDesign, restoreDesign } from "@/db/designs";
import { forkDesign } from "@/db/designs-fork";
import { AppError } from "@/db/errors";
import { getRevision, listRevisions, restoreRevision, saveRevision } from "@/db/revisions";
import { listDesignsQuerySchema } from "@/components/schemas/design";
import { auditActions, demoCircuit, makeUser, makeWorkspace, withSourceResistor } from "./design-fixtures";

const query = (q: Record<string, unknown> = {}) => listDesignsQuerySchema.parse(q);

async function codeOf(promise: Promise<unknown>): Promise<string> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof AppError) return `${error.status} ${error.code}`;
    throw error;
  }
  return "resolved";
}

let tomas: string;
let ines: string;
let ws: string;
let other: string;

beforeAll(async () => {
  tomas = await makeUser("Tomas Test");
  ines = await makeUser("Ines Test");
  ws = await makeWorkspace({ [tomas]: "designer", [ines]: "designer" });
  other = await makeWorkspace({ [tomas]: "owner" });
});
afterAll(() => getPool().end());

describe("designs", () => {
  it("creates from a circuit file and from the empty starting circuit, with revision 1 as head", async () => {
    const fromFile = await createDesign(ws, tomas, { title: "LA-47 follower", circuit: demoCircuit(), message: "First cut" });
    const design = await getDesign(ws, fromFile.designId);
    expect(design).toMatchObject({ title: "LA-47 follower", status: "draft", headRevisionId: fromFile.revisionId, headNumber: 1 });
    const revision = await getRevision(ws, fromFile.designId, fromFile.revisionId);
    expect(revision.circuit).toEqual(demoCircuit());
    expect(revision).toMatchObject({ number: 1, parentId: null, message: "First cut", authorId: tomas, authorName: "Tomas Test" });

    const empty = await createDesign(ws, tomas, { title: "Blank sheet" });
    const blank = await getRevision(ws, empty.designId, empty.revisionId);
    expect(blank.circuit).toMatchObject({ format: "backplate/circuit", version: 1, parts: [] });
    expect(blank.message).toBe("Started from an empty circuit");
  });

  it("refuses a bad circuit with the engine's message naming the part (422), and stores nothing", async () => {
    const before = (await listDesigns(ws, query())).total;
    const bad = demoCircuit() as { parts: Array<{ id: string; values: Record<string, unknown> }> };
    bad.parts.find((p) => p.id === "RSRC")!.values.resistance = "4x7";
    const error = await createDesign(ws, tomas, { title: "Broken", circuit: bad }).catch((e) => e);
    expect(error).toBeInstanceOf(AppError);
    expect(error.status).toBe(422);
    expect(error.message).toMatch(/RSRC/);
    expect(error.detail).toMatchObject({ code: "invalid_value", part: "RSRC", field: "resistance" });
    expect((await listDesigns(ws, query())).total).toBe(before);
  });

  it("refuses a circuit file over 1 MB with 413", async () => {
    const huge = { ...demoCircuit(), notes: "x".repeat(1_000_001) };
    expect(await codeOf(createDesign(ws, tomas, { title: "Huge", circuit: huge }))).toBe("413 payload_too_large");
  });

  it("renames, soft-deletes (leaves the table), restores, and records each in the audit log", async () => {
    const wsAudit = await makeWorkspace({ [tomas]: "owner" });
    const { designId } = await createDesign(wsAudit, tomas, { title: "Old name", circuit: demoCircuit() });
    await renameDesign(wsAudit, designId, tomas, "New name");
    expect((await getDesign(wsAudit, designId)).title).toBe("New name");
    await deleteDesign(wsAudit, designId, tomas);
    expect((await listDesigns(wsAudit, query())).rows.map((r) => r.id)).not.toContain(designId);
    expect((await listDesigns(wsAudit, query({ show: "deleted" }))).rows.map((r) => r.id)).toEqual([designId]);
    expect(await codeOf(getDesign(wsAudit, designId))).toBe("404 not_found");
    expect(await codeOf(deleteDesign(wsAudit, designId, tomas))).toBe("404 not_found");
    await restoreDesign(wsAudit, designId, tomas);
    expect((await listDesigns(wsAudit, query())).rows.map((r) => r.id)).toEqual([designId]);
    expect(await codeOf(restoreDesign(wsAudit, designId, tomas))).toBe("404 not_found");
    expect(await auditActions(wsAudit)).toEqual([
      "design.create",
      "revision.create",
      "design.rename",
      "design.delete",
      "design.restore",
    ]);
  });

  it("answers 404 for another workspace's design id and for ids that are not ids", async () => {
    const { designId } = await createDesign(other, tomas, { title: "Elsewhere", circuit: demoCircuit() });
    expect(await codeOf(getDesign(ws, designId))).toBe("404 not_found");
    expect(await codeOf(renameDesign(ws, designId, tomas, "x"))).toBe("404 not_found");
    expect(await codeOf(listRevisions(ws, designId))).toBe("404 not_found");
    expect(await codeOf(getDesign(ws, "not-a-uuid"))).toBe("404 not_found");
    expect((await getDesign(other, designId)).title).toBe("Elsewhere");
  });

  it("lists with search, status and author filters, sorting and pages", async () => {
    const wsList = await makeWorkspace({ [tomas]: "designer", [ines]: "designer" });
    const titles = ["Alpha follower", "Bravo valve", "Charlie 50% pad", "Delta follower"];
    const ids: string[] = [];
    for (const title of titles) ids.push((await createDesign(wsList, tomas, { title, circuit: demoCircuit() })).designId);
    const head = await getDesign(wsList, ids[1]);
    await saveRevision(wsList, ids[1], ines, { parentRevisionId: head.headRevisionId, circuit: withSourceResistor("3k3"), message: "Lower RS" });
    await getPool().query("UPDATE designs SET status = 'approved' WHERE id = $1", [ids[3]]);

    expect((await listDesigns(wsList, query({ q: "follower" }))).rows.map((r) => r.title).sort()).toEqual(["Alpha follower", "Delta follower"]);
    expect((await listDesigns(wsList, query({ q: "50%" }))).rows.map((r) => r.title)).toEqual(["Charlie 50% pad"]);
    expect((await listDesigns(wsList, query({ q: "%" }))).rows.map((r) => r.title)).toEqual(["Charlie 50% pad"]);
    expect((await listDesigns(wsList, query({ status: "approved" }))).rows.map((r) => r.title)).toEqual(["Delta follower"]);
    expect((await listDesigns(wsList, query({ author: ines }))).rows.map((r) => r.title)).toEqual(["Bravo valve"]);
    expect((await listDesigns(wsList, query({ sort: "title", dir: "asc" }))).rows.map((r) => r.title)).toEqual(titles);
    const page2 = await listDesigns(wsList, query({ sort: "title", dir: "desc", page: 2, pageSize: 3 }));
    expect(page2).toMatchObject({ total: 4, page: 2, pageSize: 3 });
    expect(page2.rows.map((r) => r.title)).toEqual(["Alpha follower"]);
    const bravo = (await listDesigns(wsList, query({ q: "Bravo" }))).rows[0];
    expect(bravo).toMatchObject({ headNumber: 2, headAuthorName: "Ines Test", createdByName: "Tomas Test" });
    expect((await listDesignAuthors(wsList)).map((a) => a.name)).toEqual(["Ines Test", "Tomas Test"]);
  });
});

describe("revisions", () => {
  it("saves on top of the head with a parent, lists newest first, and restores an old one as a new revision", async () => {
    const { designId, revisionId: r1 } = await createDesign(ws, tomas, { title: "History", circuit: demoCircuit() });
    const r2 = await saveRevision(ws, designId, ines, { parentRevisionId: r1, circuit: withSourceResistor("3k3"), message: "RS 3k3" });
    expect(r2).toMatchObject({ number: 2, parentId: r1, authorName: "Ines Test" });
    const r3 = await restoreRevision(ws, designId, tomas, r1, { parentRevisionId: r2.id });
    expect(r3).toMatchObject({ number: 3, parentId: r2.id, message: "Restored r1" });
    expect((await getRevision(ws, designId, r3.id)).circuit).toEqual(demoCircuit());
    expect((await listRevisions(ws, designId)).map((r) => [r.number, r.message])).toEqual([
      [3, "Restored r1"],
      [2, "RS 3k3"],
      [1, "Imported circuit file"],
    ]);
    expect((await getDesign(ws, designId)).headRevisionId).toBe(r3.id);
  });

  it("answers a stale save with 409 naming who saved first, stores nothing and keeps the head", async () => {
    const { designId, revisionId: r1 } = await createDesign(ws, tomas, { title: "Contested", circuit: demoCircuit() });
    const winner = await saveRevision(ws, designId, ines, { parentRevisionId: r1, circuit: withSourceResistor("3k3"), message: "Ines first" });
    const error = await saveRevision(ws, designId, tomas, { parentRevisionId: r1, circuit: withSourceResistor("6k8"), message: "Tomas late" }).catch((e) => e);
    expect(error).toBeInstanceOf(AppError);
    expect(error.status).toBe(409);
    expect(error.message).toMatch(/Ines Test saved r2/);
    expect(error.detail).toEqual({
      headRevisionId: winner.id,
      headNumber: 2,
      authorName: "Ines Test",
      savedAt: winner.createdAt.toISOString(),
    });
    const revisions = await listRevisions(ws, designId);
    expect(revisions.map((r) => r.message)).toEqual(["Ines first", "Imported circuit file"]);
    expect((await getDesign(ws, designId)).headRevisionId).toBe(winner.id);
  });

  it("of 20 concurrent saves on one head exactly one succeeds, 19 get 409, and no number is duplicated or lost", async () => {
    const { designId, revisionId: r1 } = await createDesign(ws, tomas, { title: "Race", circuit: demoCircuit() });
    const attempts = Array.from({ length: 20 }, (_, i) =>
      saveRevision(ws, designId, i % 2 ? tomas : ines, { parentRevisionId: r1, circuit: withSourceResistor(`${i + 1}k`), message: `try ${i}` }),
    );
    const results = await Promise.allSettled(attempts);
    const won = results.filter((r) => r.status === "fulfilled");
    const lost = results.filter((r): r is PromiseRejectedResult => r.status === "rejected");
    expect(won).toHaveLength(1);
    expect(lost).toHaveLength(19);
    for (const l of lost) expect((l.reason as AppError).status).toBe(409);
    const numbers = (await listRevisions(ws, designId)).map((r) => r.number);
    expect(numbers).toEqual([2, 1]);
    const { rows } = await getPool().query("SELECT count(*)::int AS n FROM audit_log WHERE action = 'revision.create' AND detail->>'designId' = $1", [designId]);
    expect(rows[0].n).toBe(2);
  });

  it("refuses a save with a bad circuit (422) and leaves the head where it was", async () => {
    const { designId, revisionId: r1 } = await createDesign(ws, tomas, { title: "Guarded", circuit: demoCircuit() });
    const bad = { ...demoCircuit(), output: { plus: "nowhere", minus: "0" } };
    const error = await saveRevision(ws, designId, tomas, { parentRevisionId: r1, circuit: bad, message: "oops" }).catch((e) => e);
    expect(error.status).toBe(422);
    expect(error.message).toMatch(/nowhere/);
    expect((await getDesign(ws, designId)).headRevisionId).toBe(r1);
  });

  it("forks a revision into another workspace as a new design with its circuit", async () => {
    const { designId, revisionId: r1 } = await createDesign(ws, tomas, { title: "Forkable", circuit: demoCircuit() });
    await saveRevision(ws, designId, tomas, { parentRevisionId: r1, circuit: withSourceResistor("3k3"), message: "r2" });
    const fork = await forkDesign({ sourceWorkspaceId: ws, designId, revisionId: r1, targetWorkspaceId: other, actorId: tomas });
    const forked = await getDesign(other, fork.designId);
    expect(forked).toMatchObject({ title: "Forkable (fork)", forkedFromDesignId: designId, headNumber: 1 });
    expect((await getRevision(other, fork.designId, fork.revisionId)).circuit).toEqual(demoCircuit());
    expect((await getRevision(other, fork.designId, fork.revisionId)).message).toBe("Forkable r1".replace("Forkable", "Forked from Forkable"));
    expect(await codeOf(getDesign(ws, fork.designId))).toBe("404 not_found");
  });
});
