import "server-only";
import { clearAttempts, countAttempt, isLimited, type RateWindow } from "@/db/rate-limits";

/**
 * How many wrong passwords Backplate accepts before it stops checking: five per e-mail address (the rule),
 * and more per client address, because one office or one proxy may share an address among many people.
 */
export const WRONG_PASSWORDS_PER_EMAIL: RateWindow = { max: 5, windowMs: 15 * 60_000 };
export const WRONG_PASSWORDS_PER_ADDRESS: RateWindow = { max: 20, windowMs: 15 * 60_000 };

export const RATE_LIMITED_MESSAGE =
  "Too many wrong passwords. Wait 15 minutes and try again, or reset your password by e-mail.";

const emailKey = (email: string) => `sign-in:email:${email.toLowerCase()}`;
const addressKey = (address: string) => `sign-in:address:${address}`;

/**
 * The client's address: the first X-Forwarded-For entry when a proxy (or Next's own server) set one, else "unknown".
 * Behind a load balancer this is the balancer's view of the client.
 */
export function clientAddress(headers: Record<string, unknown> | Headers | undefined): string {
  const raw = headers instanceof Headers ? headers.get("x-forwarded-for") : headers?.["x-forwarded-for"];
  const first = String(Array.isArray(raw) ? raw[0] : (raw ?? "")).split(",")[0].trim();
  return first || "unknown";
}

export async function signInBlocked(email: string, address: string): Promise<boolean> {
  const [byEmail, byAddress] = await Promise.all([
    isLimited(emailKey(email), WRONG_PASSWORDS_PER_EMAIL),
    isLimited(addressKey(address), WRONG_PASSWORDS_PER_ADDRESS),
  ]);
  return byEmail || byAddress;
}

export async function recordWrongPassword(email: string, address: string): Promise<void> {
  await Promise.all([
    countAttempt(emailKey(email), WRONG_PASSWORDS_PER_EMAIL),
    countAttempt(addressKey(address), WRONG_PASSWORDS_PER_ADDRESS),
  ]);
}

/** A right password forgives the e-mail's earlier slips (the address counter keeps running). */
export async function recordRightPassword(email: string): Promise<void> {
  await clearAttempts(emailKey(email));
}
