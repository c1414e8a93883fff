import { Pool } from "pg";
import { afterAll, describe, expect, inject, it } from "vitest";
import { DEMO_PEOPLE, DEMO_WORKSPACE } from "../../db/demo-people";
import { seedDemo } from "../../db/seed";

const url = inject("databaseUrl");
const pool = new Pool({ connectionString: url });
afterAll(() => pool.end());

describe("demo seed", () => {
  it("creates the invented workspace with one member per demo person, and is idempotent", async () => {
    await seedDemo(url);
    await seedDemo(url);
    const { rows } = await pool.query(
      `SELECT u.email, m.role FROM memberships m JOIN users u ON u.id = m.user_id
       JOIN workspaces w ON w.id = m.workspace_id WHERE w.slug = $1 ORDER BY u.email`,
      [DEMO_WORKSPACE.slug],
    );
    expect(rows).toEqual(
      [...DEMO_PEOPLE].map((p) => ({ email: p.email, role: p.role })).sort((a, b) => a.email.localeCompare(b.email)),
    );
  });

  it("stores password hashes, never the password", async () => {
    // The demo people only: other tests add people of their own (some, like link-only accounts, without a password).
    const { rows } = await pool.query("SELECT password_hash FROM users WHERE email = ANY($1)", [DEMO_PEOPLE.map((p) => p.email)]);
    expect(rows).toHaveLength(DEMO_PEOPLE.length);
    for (const row of rows) expect(row.password_hash).toMatch(/^\$2[aby]\$/);
  });
});
