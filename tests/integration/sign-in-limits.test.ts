import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import {
  recordRightPassword,
  recordWrongPassword,
  signInBlocked,
  WRONG_PASSWORDS_PER_ADDRESS,
  WRONG_PASSWORDS_PER_EMAIL,
} from "../../app/_server/sign-in-limits";
import { countAttempt } from "../../db/rate-limits";

describe("sign-in rate limit in the rate_limits table", () => {
  it("blocks an e-mail after five wrong passwords and a right one clears it", async () => {
    const email = `limit-${randomUUID()}@test.example`;
    for (let i = 0; i < WRONG_PASSWORDS_PER_EMAIL.max - 1; i++) await recordWrongPassword(email, `203.0.113.${i}`);
    expect(await signInBlocked(email, "203.0.113.200")).toBe(false);
    await recordWrongPassword(email, "203.0.113.99");
    expect(await signInBlocked(email, "203.0.113.200")).toBe(true);
    expect(await signInBlocked(`other-${email}`, "203.0.113.200")).toBe(false);
    await recordRightPassword(email);
    expect(await signInBlocked(email, "203.0.113.200")).toBe(false);
  });

  it("blocks a client address after its own limit, across e-mails", async () => {
    const address = `198.18.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}-${randomUUID().slice(0, 4)}`;
    for (let i = 0; i < WRONG_PASSWORDS_PER_ADDRESS.max; i++) await recordWrongPassword(`p${i}-${randomUUID()}@test.example`, address);
    expect(await signInBlocked(`fresh-${randomUUID()}@test.example`, address)).toBe(true);
  });

  it("starts a new window once the old one has passed", async () => {
    const key = `test:${randomUUID()}`;
    const shortWindow = { max: 2, windowMs: 200 };
    expect(await countAttempt(key, shortWindow)).toBe(1);
    expect(await countAttempt(key, shortWindow)).toBe(2);
    await new Promise((resolve) => setTimeout(resolve, 400));
    expect(await countAttempt(key, shortWindow)).toBe(1);
  });
});
