import "server-only";
import bcrypt from "bcryptjs";

/** bcrypt cost for passwords people choose (pinned: 12, about a quarter second per hash on a current server core). */
export const PASSWORD_HASH_COST = 12;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, PASSWORD_HASH_COST);
}

export function checkPassword(password: string, hash: string | null): Promise<boolean> {
  return hash ? bcrypt.compare(password, hash) : Promise.resolve(false);
}
