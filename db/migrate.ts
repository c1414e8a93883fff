/**
 * Applies the committed migrations in drizzle/ to a database. Used by `npm start` and by the test setup; not
 * server-only because it runs from scripts.
 */
import path from "node:path";
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";

export const MIGRATIONS_FOLDER = path.resolve(import.meta.dirname, "..", "drizzle");

export async function applyMigrations(url: string): Promise<void> {
  const pool = new Pool({ connectionString: url, max: 1 });
  try {
    await migrate(drizzle(pool), { migrationsFolder: MIGRATIONS_FOLDER });
  } finally {
    await pool.end();
  }
}
