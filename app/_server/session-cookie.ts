import "server-only";
import { decode, type JWT } from "next-auth/jwt";
import { cookies, headers } from "next/headers";
import { cache } from "react";
import { servedOverHttps } from "./secure-cookies";

/**
 * The signed-in person's session token, read from next-auth's session cookie without going through
 * getServerSession. That call runs next-auth's whole session endpoint on every request: two key derivations, a
 * decryption and a fresh encryption of a cookie that a server component or route handler cannot even send back.
 * Here a cookie is decrypted once and its payload kept until the token expires: a given cookie value always
 * decrypts to the same payload, so the cache changes no answer, only the CPU time. Sessions are still rolled by
 * next-auth's own endpoint, which the browser's session provider calls.
 */

/** next-auth v4's session cookie, and its name when served over HTTPS (useSecureCookies). */
const COOKIE_NAME = "next-auth.session-token";
const SECURE_COOKIE_NAME = `__Secure-${COOKIE_NAME}`;
/** Decoded cookies kept per process; the oldest-used goes when full. */
const MAX_CACHED_TOKENS = 2000;
/** next-auth decodes with this clock tolerance, s (node_modules/next-auth/jwt). */
const CLOCK_TOLERANCE_S = 15;

const decoded = new Map<string, JWT>();

/** next-auth splits a cookie over 4 kB into `name.0`, `name.1`, …; joined in index order, as its SessionStore does. */
export function joinCookieChunks(name: string, all: { name: string; value: string }[]): string | null {
  const whole = all.find((c) => c.name === name);
  if (whole) return whole.value;
  const chunks = all
    .filter((c) => c.name.startsWith(`${name}.`) && /^\d+$/.test(c.name.slice(name.length + 1)))
    .sort((a, b) => Number(a.name.slice(name.length + 1)) - Number(b.name.slice(name.length + 1)));
  return chunks.length > 0 ? chunks.map((c) => c.value).join("") : null;
}

function unexpired(token: JWT, nowS: number): boolean {
  return typeof token.exp !== "number" || token.exp + CLOCK_TOLERANCE_S > nowS;
}

/** The payload of a session cookie value, or null when it is not one of ours or has expired. */
export async function decodeSessionCookie(value: string, secret: string): Promise<JWT | null> {
  const nowS = Date.now() / 1000;
  const known = decoded.get(value);
  if (known) {
    if (!unexpired(known, nowS)) {
      decoded.delete(value);
      return null;
    }
    decoded.delete(value);
    decoded.set(value, known);
    return known;
  }
  let token: JWT | null;
  try {
    token = await decode({ token: value, secret });
  } catch {
    return null; // tampered, from another secret, or expired: not signed in
  }
  if (!token || !unexpired(token, nowS)) return null;
  decoded.set(value, token);
  if (decoded.size > MAX_CACHED_TOKENS) decoded.delete(decoded.keys().next().value as string);
  return token;
}

/** The session token of the request being handled or rendered (once per request), or null when signed out. */
export const requestSessionToken = cache(async (): Promise<JWT | null> => {
  // the request's headers and cookies are read first, whatever follows: reading them is what marks a page as
  // rendered per request, so no page that asks who is signed in is ever prerendered at build time
  const secure = servedOverHttps((await headers()).get("x-forwarded-proto"), process.env.NEXTAUTH_URL);
  const value = joinCookieChunks(secure ? SECURE_COOKIE_NAME : COOKIE_NAME, (await cookies()).getAll());
  const secret = process.env.NEXTAUTH_SECRET;
  return value && secret ? decodeSessionCookie(value, secret) : null;
});
