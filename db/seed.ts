/**
 * Seeds the demo scenario into a database. Idempotent: people and the workspace are matched by e-mail and slug, so
 * running it on every `npm start` changes nothing that exists.
 */
import { createHash, randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { DEMO_PASSWORD, DEMO_PENDING_INVITATION, DEMO_PEOPLE, DEMO_WORKSPACE } from "./demo-people";
import { invitations, memberships, users, workspaces } from "./schema";
import { seedDesigns } from "./seed-designs";
import { seedReviews } from "./seed-reviews";

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
      await seedPendingInvitation(tx, workspace.id);
      await seedDesigns(tx, workspace.id);
      await seedReviews(tx, workspace.id);
    });
  } finally {
    await pool.end();
  }
}

/** Invitations of the seed live as long as real ones would (7 days) from each start. */
const SEED_INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60_000;

/**
 * Keeps one open invitation in the demo workspace so the members page shows one. Its token is random and never
 * mailed (nobody is meant to accept it); an expired one is renewed, one the owner revoked stays revoked.
 */
async function seedPendingInvitation(tx: Parameters<Parameters<ReturnType<typeof drizzle>["transaction"]>[0]>[0], workspaceId: string) {
  const existing = await tx
    .select({ id: invitations.id })
    .from(invitations)
    .where(sql`${invitations.workspaceId} = ${workspaceId} and ${invitations.email} = ${DEMO_PENDING_INVITATION.email}`);
  const expiresAt = new Date(Date.now() + SEED_INVITATION_LIFETIME_MS);
  if (existing.length > 0) {
    await tx
      .update(invitations)
      .set({ expiresAt })
      .where(sql`${invitations.workspaceId} = ${workspaceId} and ${invitations.email} = ${DEMO_PENDING_INVITATION.email}
        and ${invitations.acceptedAt} is null and ${invitations.revokedAt} is null`);
    return;
  }
  const [owner] = await tx
    .select({ id: users.id })
    .from(users)
    .where(sql`lower(${users.email}) = lower(${DEMO_PEOPLE[0].email})`);
  await tx.insert(invitations).values({
    workspaceId,
    email: DEMO_PENDING_INVITATION.email,
    role: DEMO_PENDING_INVITATION.role,
    tokenHash: createHash("sha256").update(randomBytes(32).toString("base64url")).digest("hex"),
    invitedBy: owner.id,
    expiresAt,
  });
}
