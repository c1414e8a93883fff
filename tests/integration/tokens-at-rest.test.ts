/**
 * Link tokens at rest: after a bench link, an invitation and a password reset are made, no row of any table in the
 * database holds the raw token anywhere (every column, read as text), and the SHA-256 of it is what is stored
 * (OWASP password-reset and session guidance: store only a hash of a bearer token; SHA-256 from node:crypto as the
 * independent computation).
 */
import { createHash } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { getPool } from "../../db/client";
import { createDesign } from "../../db/designs";
import { createInvitation } from "../../db/invitations";
import { createPasswordReset } from "../../db/password-resets";
import { createShareLink } from "../../db/share-links";
import { benchViewSchema } from "../../components/schemas/design-bench-link";
import { makePerson, makeWorkspace } from "./accounts-fixtures";
import { demoCircuit } from "./design-fixtures";

afterAll(() => getPool().end());

const sha256 = (token: string) => createHash("sha256").update(token, "utf8").digest("hex");

/** Tables whose rows, read whole as text, contain `needle`. */
async function tablesHolding(needle: string): Promise<string[]> {
  const { rows: tables } = await getPool().query("SELECT tablename FROM pg_tables WHERE schemaname = 'public'");
  const holding: string[] = [];
  for (const { tablename } of tables) {
    const { rows } = await getPool().query(`SELECT count(*)::int AS n FROM "${tablename}" t WHERE position($1 in t::text) > 0`, [needle]);
    if (rows[0].n > 0) holding.push(tablename);
  }
  return holding;
}

describe("tokens at rest", () => {
  it("keeps only hashes of bench-link, invitation and reset tokens", async () => {
    const { workspace, people } = await makeWorkspace(["owner"]);
    const owner = people.owner.id;
    const { designId, revisionId } = await createDesign(workspace.workspaceId, owner, { title: "Token check", circuit: demoCircuit() });
    const share = await createShareLink(workspace.workspaceId, designId, owner, {
      revisionId,
      isPublic: false,
      view: benchViewSchema.parse({}),
      label: "token check",
    });
    let invitationToken = "";
    await createInvitation({ workspaceId: workspace.workspaceId, actorId: owner, email: "token-check@people.example", role: "viewer" }, async (token) => {
      invitationToken = token;
    });
    const resetToken = await createPasswordReset((await makePerson("token-reset")).id);

    for (const [what, token, table] of [
      ["bench link", share.token, "share_links"],
      ["invitation", invitationToken, "invitations"],
      ["password reset", resetToken, "password_reset_tokens"],
    ] as const) {
      expect(token, what).toMatch(/^[A-Za-z0-9_-]{43}$/);
      expect(await tablesHolding(token), `${what}: tables holding the raw token`).toEqual([]);
      expect(await tablesHolding(sha256(token)), `${what}: where its hash is`).toEqual([table]);
    }
  });
});
