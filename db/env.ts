/** Where the database is. The default matches the cluster that `npm start` runs (scripts/lib/services.ts). */
export const DEFAULT_DATABASE_URL = "postgres://app@127.0.0.1:54329/backplate";

export function databaseUrl(): string {
  return process.env.DATABASE_URL || DEFAULT_DATABASE_URL;
}
