import "server-only";
import { sql } from "drizzle-orm";
import { getDb } from "./client";
import { users } from "./schema";

export type UserRow = typeof users.$inferSelect;

export async function findUserByEmail(email: string): Promise<UserRow | null> {
  const rows = await getDb().select().from(users).where(sql`lower(${users.email}) = lower(${email})`).limit(1);
  return rows[0] ?? null;
}

export async function getUserById(id: string): Promise<UserRow | null> {
  const rows = await getDb().select().from(users).where(sql`${users.id} = ${id}`).limit(1);
  return rows[0] ?? null;
}
