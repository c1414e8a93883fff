import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "./client";
import { AppError } from "./errors";
import { passwordResetTokens, users } from "./schema";
import { hashToken, newToken } from "./tokens";

/** How long a reset link works (pinned: 1 hour), ms. */
export const RESET_LINK_LIFETIME_MS = 60 * 60_000;

/** Stores a new reset token for the person and returns the token for the link (shown once, in the mail). */
export async function createPasswordReset(userId: string, now = new Date()): Promise<string> {
  const { token, hash } = newToken();
  await getDb()
    .insert(passwordResetTokens)
    .values({ userId, tokenHash: hash, expiresAt: new Date(now.getTime() + RESET_LINK_LIFETIME_MS) });
  return token;
}

/** Checks a reset token without using it (for the page that asks for the new password). */
export async function checkPasswordReset(token: string): Promise<{ email: string }> {
  const [row] = await getDb()
    .select({ expiresAt: passwordResetTokens.expiresAt, usedAt: passwordResetTokens.usedAt, email: users.email })
    .from(passwordResetTokens)
    .innerJoin(users, eq(users.id, passwordResetTokens.userId))
    .where(eq(passwordResetTokens.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) throw new AppError("not_found", "This reset link is not valid. Ask for a new one.");
  if (row.usedAt) throw new AppError("gone", "This reset link was used already. Ask for a new one if you need it.");
  if (row.expiresAt.getTime() < Date.now()) throw new AppError("gone", "This reset link has expired (links work for 1 hour). Ask for a new one.");
  return { email: row.email };
}

/**
 * Sets the new password and uses the token up, in one transaction; the row lock means two clicks on the same link
 * cannot both succeed. Every other open reset link of the person is used up too.
 */
export async function completePasswordReset(token: string, passwordHash: string): Promise<{ userId: string; email: string }> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(passwordResetTokens)
      .where(eq(passwordResetTokens.tokenHash, hashToken(token)))
      .for("update");
    if (!row) throw new AppError("not_found", "This reset link is not valid. Ask for a new one.");
    if (row.usedAt) throw new AppError("gone", "This reset link was used already. Ask for a new one if you need it.");
    if (row.expiresAt.getTime() < Date.now()) {
      throw new AppError("gone", "This reset link has expired (links work for 1 hour). Ask for a new one.");
    }
    const [user] = await tx.update(users).set({ passwordHash }).where(eq(users.id, row.userId)).returning({ email: users.email });
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResetTokens.userId, row.userId), isNull(passwordResetTokens.usedAt)));
    return { userId: row.userId, email: user.email };
  });
}
