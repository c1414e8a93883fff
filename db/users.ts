import "server-only";
import { eq, sql } from "drizzle-orm";
import { getDb } from "./client";
import { AppError } from "./errors";
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

export const EMAIL_TAKEN_MESSAGE = "An account already uses this e-mail address. Sign in, or reset its password.";

/** A new person with a password (sign-up). The unique index on lower(email) decides races between two sign-ups. */
export async function createUserWithPassword(input: { name: string; email: string; passwordHash: string }): Promise<UserRow> {
  try {
    const [row] = await getDb().insert(users).values(input).returning();
    return row;
  } catch (error) {
    if ((error as { cause?: { code?: string }; code?: string }).cause?.code === "23505" || (error as { code?: string }).code === "23505") {
      throw new AppError("conflict", EMAIL_TAKEN_MESSAGE, { fields: { email: EMAIL_TAKEN_MESSAGE } });
    }
    throw error;
  }
}

export async function updateUserName(id: string, name: string): Promise<void> {
  await getDb().update(users).set({ name }).where(eq(users.id, id));
}

export async function updateUserPasswordHash(id: string, passwordHash: string): Promise<void> {
  await getDb().update(users).set({ passwordHash }).where(eq(users.id, id));
}
