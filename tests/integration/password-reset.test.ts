import bcrypt from "bcryptjs";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "../../db/client";
import { checkPasswordReset, completePasswordReset, createPasswordReset, RESET_LINK_LIFETIME_MS } from "../../db/password-resets";
import { passwordResetTokens, users } from "../../db/schema";
import { makePerson } from "./accounts-fixtures";

describe("password reset tokens", () => {
  it("stores only the SHA-256 of the token, sets the password once, then refuses the link", async () => {
    const person = await makePerson("forgetful");
    const token = await createPasswordReset(person.id);
    const [row] = await getDb().select().from(passwordResetTokens).where(eq(passwordResetTokens.userId, person.id));
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(row.tokenHash).not.toContain(token);
    expect(await checkPasswordReset(token)).toEqual({ email: person.email });
    await completePasswordReset(token, await bcrypt.hash("a-new-password-1", 4));
    const [after] = await getDb().select().from(users).where(eq(users.id, person.id));
    expect(await bcrypt.compare("a-new-password-1", after.passwordHash ?? "")).toBe(true);
    await expect(completePasswordReset(token, "x")).rejects.toMatchObject({ code: "gone", message: /used already/ });
  });

  it("refuses an expired link and leaves the password as it was", async () => {
    const person = await makePerson("slow");
    const token = await createPasswordReset(person.id, new Date(Date.now() - RESET_LINK_LIFETIME_MS - 60_000));
    await expect(checkPasswordReset(token)).rejects.toMatchObject({ code: "gone", message: /expired/ });
    await expect(completePasswordReset(token, "hash")).rejects.toMatchObject({ code: "gone" });
    const [after] = await getDb().select().from(users).where(eq(users.id, person.id));
    expect(after.passwordHash).toBe(person.passwordHash);
  });
});
