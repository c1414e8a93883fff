import "server-only";
import { AppError } from "@/db/errors";
import { countAttempt, type RateWindow } from "@/db/rate-limits";
import { clientAddress } from "./sign-in-limits";

/**
 * Limits on the account forms a stranger can reach without signing in: sign-up (mass account creation), asking for
 * a reset link (mail bombing one address) and setting a password with a reset token (token guessing). Every request
 * counts, valid or not, and is counted before any password hashing or mail, so a flood costs the server little.
 * Per-address windows are wide because an office or a proxy may share one address among many people.
 */
export const SIGN_UPS_PER_ADDRESS: RateWindow = { max: 30, windowMs: 60 * 60_000 };
export const RESET_REQUESTS_PER_EMAIL: RateWindow = { max: 5, windowMs: 60 * 60_000 };
export const RESET_REQUESTS_PER_ADDRESS: RateWindow = { max: 30, windowMs: 60 * 60_000 };
export const RESET_COMPLETIONS_PER_ADDRESS: RateWindow = { max: 30, windowMs: 60 * 60_000 };

async function spend(key: string, window: RateWindow, message: string): Promise<void> {
  if ((await countAttempt(key, window)) > window.max) throw new AppError("rate_limited", message);
}

export async function limitSignUp(request: Request): Promise<void> {
  await spend(
    `sign-up:address:${clientAddress(request.headers)}`,
    SIGN_UPS_PER_ADDRESS,
    "Too many accounts were made from your network in the last hour. Wait an hour and try again, or ask an owner to invite you.",
  );
}

export async function limitResetRequest(request: Request, email: string): Promise<void> {
  const message = "Too many reset links were asked for. Wait an hour, then ask again; the last link sent still works for 1 hour.";
  await spend(`reset-request:address:${clientAddress(request.headers)}`, RESET_REQUESTS_PER_ADDRESS, message);
  await spend(`reset-request:email:${email.toLowerCase()}`, RESET_REQUESTS_PER_EMAIL, message);
}

export async function limitResetCompletion(request: Request): Promise<void> {
  await spend(
    `reset-complete:address:${clientAddress(request.headers)}`,
    RESET_COMPLETIONS_PER_ADDRESS,
    "Too many attempts to set a password from your network. Wait an hour, then open the newest reset link again.",
  );
}
