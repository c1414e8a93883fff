/**
 * Seeds the demo scenario into a database. Idempotent: people and the workspace are matched by e-mail and slug, so
 * running it on every `npm start` changes nothing that exists.
 */
import bcrypt from "bcryptjs";
import { sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_WORKSPACE } from "./demo-people";
import { memberships, users, workspaces } from "./schema";

/** bcrypt cost for demo accounts; real sign-ups use the cost in the auth module. */
const DEMO_HASH_ROUNDS = 10;

export async function seedDemo(url: string): Promise<void> {
  const pool = new Pool({ connectionString: url, max: 2 });
  const db = drizzle(pool);
  try {
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, DEMO_HASH_ROUNDS);
    await db.transaction(async (tx) => {
      const [workspace] = await tx
        .insert(workspaces)
        .values({ slug: DEMO_WORKSPACE.slug, name: DEMO_WORKSPACE.name })
        .onConflictDoUpdate({ target: workspaces.slug, set: { name: sql`${workspaces.name}` } })
        .returning({ id: workspaces.id });
      for (const person of DEMO_PEOPLE) {
        const existing = await tx
          .select({ id: users.id })
          .from(users)
          .where(sql`lower(${users.email}) = lower(${person.email})`);
        const userId =
          existing[0]?.id ??
          (
            await tx
              .insert(users)
              .values({ email: person.email, name: person.name, passwordHash, emailVerified: new Date() })
              .returning({ id: users.id })
          )[0].id;
        await tx
          .insert(memberships)
          .values({ workspaceId: workspace.id, userId, role: person.role })
          .onConflictDoNothing();
      }
    });
  } finally {
    await pool.end();
  }
}
