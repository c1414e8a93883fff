import { Pool } from "pg";
import { afterAll, describe, expect, inject, it } from "vitest";
import { DEMO_WORKSPACE } from "../../db/demo-people";
import { seedDemo } from "../../db/seed";
import { DEMO_DESIGNS, demoRevisionCircuits } from "../../db/seed-designs";
import { diffCircuits } from "../../components/designs/circuit-diff";

const url = inject("databaseUrl");
const pool = new Pool({ connectionString: url });
afterAll(() => pool.end());

describe("demo designs seed", () => {
  it("stores each demo design once with its revisions in order, by the demo designers, and is idempotent", async () => {
    await seedDemo(url);
    await seedDemo(url);
    const { rows } = await pool.query(
      `SELECT d.title, d.status, d.deleted_at IS NOT NULL AS deleted, r.number, r.message, u.email,
              r.id = d.head_revision_id AS is_head
         FROM designs d JOIN workspaces w ON w.id = d.workspace_id
         JOIN design_revisions r ON r.design_id = d.id JOIN users u ON u.id = r.author_id
        WHERE w.slug = $1 ORDER BY d.title, r.number`,
      [DEMO_WORKSPACE.slug],
    );
    for (const demo of DEMO_DESIGNS) {
      const mine = rows.filter((r) => r.title === demo.title);
      expect(mine.map((r) => r.number)).toEqual(demo.steps.map((_, i) => i + 1));
      expect(mine.map((r) => r.message)).toEqual(demo.steps.map((s) => s.message));
      expect(mine.at(-1)?.is_head).toBe(true);
      expect(mine[0]).toMatchObject({ status: demo.status, deleted: Boolean(demo.deleted) });
      for (const r of mine) expect(r.email).toMatch(/^(tomas|ines)@larkfield\.example$/);
    }
    expect(new Set(rows.map((r) => r.status)).size).toBeGreaterThanOrEqual(3);
    expect(rows.filter((r) => r.deleted && r.is_head)).toHaveLength(1);
  });

  it("changes a value between consecutive revisions (the diff is never empty)", () => {
    for (const demo of DEMO_DESIGNS) {
      const circuits = demoRevisionCircuits(demo);
      for (let i = 1; i < circuits.length; i++) {
        const diff = diffCircuits(circuits[i - 1], circuits[i]);
        expect(diff.same, `${demo.title} r${i + 1}`).toBe(false);
        expect(diff.parameters.length).toBeGreaterThan(0);
      }
    }
  });
});
