import "server-only";
import bcrypt from "bcryptjs";

/**
 * bcrypt cost for passwords people choose (pinned: 12). With bcryptjs (pure JavaScript) one hash took 2.2 s on the
 * busy test machine; that cost is paid at sign-up, password change and reset, and again at each sign-in's compare.
 */
export const PASSWORD_HASH_COST = 12;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, PASSWORD_HASH_COST);
}

export function checkPassword(password: string, hash: string | null): Promise<boolean> {
  return hash ? bcrypt.compare(password, hash) : Promise.resolve(false);
}
