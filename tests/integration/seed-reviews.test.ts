import { Pool } from "pg";
import { afterAll, describe, expect, inject, it } from "vitest";
import { seedDemo } from "../../db/seed";

const url = inject("databaseUrl");
const pool = new Pool({ connectionString: url });
afterAll(() => pool.end());

describe("demo review seed", () => {
  it("puts one review with remarks on the LA-47, once however often it runs", async () => {
    await seedDemo(url);
    await seedDemo(url);
    const { rows: found } = await pool.query(
      `SELECT r.id, r.status, d.status AS design_status FROM reviews r JOIN designs d ON d.id = r.design_id
       JOIN workspaces w ON w.id = d.workspace_id WHERE w.slug = 'larkfield' AND d.title = 'LA-47 studio condenser'`,
    );
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ status: "open", design_status: "in_review" });
    const { rows: remarks } = await pool.query("SELECT anchor, parent_id FROM remarks WHERE review_id = $1 ORDER BY created_at", [found[0].id]);
    expect(remarks.map((r) => r.anchor.type)).toEqual(["part", "part", "frequency"]);
    expect(remarks.filter((r) => r.parent_id)).toHaveLength(1);
    const { rows: reviewers } = await pool.query("SELECT count(*)::int AS n FROM review_reviewers WHERE review_id = $1", [found[0].id]);
    expect(reviewers[0].n).toBe(2);
  });
});
