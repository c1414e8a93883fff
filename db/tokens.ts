import "server-only";
import { createHash, randomBytes } from "node:crypto";

/**
 * One-time tokens for reset and invitation links: 32 random bytes (256 bits) in base64url (43 characters) for the
 * link; only the SHA-256 hex of it is stored, and a link is found by hashing what it carries.
 */
export const TOKEN_BYTES = 32;

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export function newToken(): { token: string; hash: string } {
  const token = randomBytes(TOKEN_BYTES).toString("base64url");
  return { token, hash: hashToken(token) };
}
