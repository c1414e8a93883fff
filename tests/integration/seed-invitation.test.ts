import { Pool } from "pg";
import { afterAll, describe, expect, inject, it } from "vitest";
import { DEMO_PENDING_INVITATION, DEMO_WORKSPACE } from "../../db/demo-people";
import { seedDemo } from "../../db/seed";

const url = inject("databaseUrl");
const pool = new Pool({ connectionString: url });
afterAll(() => pool.end());

describe("demo seed's open invitation", () => {
  it("keeps exactly one open, unexpired invitation however often the seed runs", async () => {
    await seedDemo(url);
    await seedDemo(url);
    const { rows } = await pool.query(
      `SELECT i.email, i.role, i.expires_at > now() AS live, length(i.token_hash) AS hash_length FROM invitations i
       JOIN workspaces w ON w.id = i.workspace_id WHERE w.slug = $1 AND i.accepted_at IS NULL AND i.revoked_at IS NULL`,
      [DEMO_WORKSPACE.slug],
    );
    expect(rows).toEqual([{ email: DEMO_PENDING_INVITATION.email, role: DEMO_PENDING_INVITATION.role, live: true, hash_length: 64 }]);
  });
});
