/** People and workspaces made fresh for each integration test, so tests sharing the run's database do not collide. */
import { randomUUID } from "node:crypto";
import bcrypt from "bcryptjs";
import { createWorkspace } from "../../db/workspaces";
import { getDb } from "../../db/client";
import { memberships, users } from "../../db/schema";
import type { Role } from "../../components/auth/roles";

/** Low bcrypt cost for test people only: the tests check behaviour, not hashing time. */
const TEST_HASH_COST = 4;
export const TEST_PASSWORD = "correct-horse-battery";

export async function makePerson(label: string) {
  const email = `${label}-${randomUUID().slice(0, 8)}@test.example`;
  const [row] = await getDb()
    .insert(users)
    .values({ email, name: `Test ${label}`, passwordHash: await bcrypt.hash(TEST_PASSWORD, TEST_HASH_COST) })
    .returning();
  return row;
}

/** A workspace with one person per role named in `roles` (the first owner creates it). */
export async function makeWorkspace(roles: Role[] = ["owner", "designer", "reviewer", "viewer"]) {
  const owner = await makePerson("owner");
  const workspace = await createWorkspace(owner.id, `Test bench ${randomUUID().slice(0, 6)}`);
  const people: Record<string, Awaited<ReturnType<typeof makePerson>>> = { owner };
  for (const role of roles.slice(1)) {
    const person = await makePerson(role);
    await getDb().insert(memberships).values({ workspaceId: workspace.workspaceId, userId: person.id, role });
    people[role] = person;
  }
  return { workspace, people };
}
