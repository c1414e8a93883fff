import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { benchViewSchema } from "@/components/schemas/design-bench-link";
import { getPool } from "@/db/client";
import { createDesign, deleteDesign } from "@/db/designs";
import { AppError } from "@/db/errors";
import { saveRevision } from "@/db/revisions";
import { createShareLink, findShareLink, hashShareToken, listShareLinks, recordShareAccess, revokeShareLink } from "@/db/share-links";
import { auditActions, demoCircuit, makeUser, makeWorkspace, withSourceResistor } from "./design-fixtures";

const view = benchViewSchema.parse({ plot: "response", variant: "pad", fromHz: 20, toHz: 20000 });

async function failure(promise: Promise<unknown>): Promise<AppError> {
  const error = await promise.then(() => null, (e) => e);
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

let owner: string;
let ws: string;
beforeAll(async () => {
  owner = await makeUser("Orla Test");
  ws = await makeWorkspace({ [owner]: "owner" });
});
afterAll(() => getPool().end());

describe("bench links", () => {
  it("makes a 256-bit base64url token, stores only its SHA-256 hash, and opens the pinned revision", async () => {
    const { designId, revisionId } = await createDesign(ws, owner, { title: "Shared", circuit: demoCircuit() });
    const { token, link } = await createShareLink(ws, designId, owner, { revisionId, isPublic: true, view, label: "for Margit" });
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/); // 32 bytes → 43 base64url characters
    expect(Buffer.from(token, "base64url")).toHaveLength(32);
    const { rows } = await getPool().query("SELECT token_hash FROM share_links WHERE id = $1", [link.id]);
    expect(rows[0].token_hash).toBe(hashShareToken(token));
    expect(rows[0].token_hash).not.toContain(token);
    const opened = await findShareLink(token);
    expect(opened).toMatchObject({ designId, revisionId, pinnedRevisionId: revisionId, opensWithoutSignIn: true, view });
    expect(link).toMatchObject({ label: "for Margit", revisionNumber: 1, accessCount: 0 });
  });

  it("follows the latest revision when not pinned, and counts every opening", async () => {
    const { designId, revisionId: r1 } = await createDesign(ws, owner, { title: "Latest", circuit: demoCircuit() });
    const { token, link } = await createShareLink(ws, designId, owner, { view });
    const r2 = await saveRevision(ws, designId, owner, { parentRevisionId: r1, circuit: withSourceResistor("3k3"), message: "r2" });
    expect((await findShareLink(token)).revisionId).toBe(r2.id);
    await Promise.all(Array.from({ length: 5 }, () => recordShareAccess(link.id)));
    expect((await listShareLinks(ws, designId))[0].accessCount).toBe(5);
    expect((await findShareLink(token)).opensWithoutSignIn).toBe(false);
  });

  it("an expired link is 410 with the reason; an unknown token is 404", async () => {
    const { designId } = await createDesign(ws, owner, { title: "Expiring", circuit: demoCircuit() });
    const { token, link } = await createShareLink(ws, designId, owner, { view, expiresAt: new Date(Date.now() + 60_000).toISOString() });
    await getPool().query("UPDATE share_links SET expires_at = now() - interval '1 second' WHERE id = $1", [link.id]);
    const gone = await failure(findShareLink(token));
    expect(gone.status).toBe(410);
    expect(gone.message).toMatch(/expired/);
    expect((await failure(findShareLink("x".repeat(43)))).status).toBe(404);
  });

  it("a revoked link is 410, cannot be revoked twice, and both steps are in the audit log", async () => {
    const wsAudit = await makeWorkspace({ [owner]: "owner" });
    const { designId } = await createDesign(wsAudit, owner, { title: "Revocable", circuit: demoCircuit() });
    const { token, link } = await createShareLink(wsAudit, designId, owner, { view });
    await revokeShareLink(wsAudit, designId, link.id, owner);
    const gone = await failure(findShareLink(token));
    expect(gone.status).toBe(410);
    expect(gone.message).toMatch(/revoked/);
    expect((await failure(revokeShareLink(wsAudit, designId, link.id, owner))).status).toBe(404);
    expect(await auditActions(wsAudit)).toEqual(["design.create", "revision.create", "share.create", "share.revoke"]);
  });

  it("a link to a deleted design is 410, and one where the workspace forbids public links needs sign-in", async () => {
    const closed = await makeWorkspace({ [owner]: "owner" }, false);
    const { designId } = await createDesign(closed, owner, { title: "Closed", circuit: demoCircuit() });
    const { token } = await createShareLink(closed, designId, owner, { view, isPublic: true });
    expect((await findShareLink(token)).opensWithoutSignIn).toBe(false);
    await deleteDesign(closed, designId, owner);
    expect((await failure(findShareLink(token))).status).toBe(410);
  });

  it("refuses a view naming a variant the circuit does not have (422), and stores no link", async () => {
    const { designId } = await createDesign(ws, owner, { title: "Variants", circuit: demoCircuit() });
    const wrong = benchViewSchema.parse({ plot: "response", variant: "louder" });
    const error = await failure(createShareLink(ws, designId, owner, { view: wrong }));
    expect(error.status).toBe(422);
    expect(error.message).toMatch(/“hotter bias”, “pad”/);
    expect(await listShareLinks(ws, designId)).toEqual([]);
  });

  it("refuses a revision of another design and a design of another workspace (404)", async () => {
    const a = await createDesign(ws, owner, { title: "A", circuit: demoCircuit() });
    const b = await createDesign(ws, owner, { title: "B", circuit: demoCircuit() });
    expect((await failure(createShareLink(ws, a.designId, owner, { view, revisionId: b.revisionId }))).status).toBe(404);
    const elsewhere = await makeWorkspace({ [owner]: "owner" });
    expect((await failure(createShareLink(elsewhere, a.designId, owner, { view }))).status).toBe(404);
  });
});
