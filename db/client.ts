import "server-only";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { databaseUrl } from "./env";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;

/** How long a request waits for a connection before the database counts as down. */
const CONNECT_TIMEOUT_MS = 2_000;

interface Handle {
  pool: Pool;
  db: Database;
}

// One pool per process, kept on globalThis so the dev server's module reloads do not open new pools.
const globalForDb = globalThis as unknown as { backplateDb?: Handle };

function open(): Handle {
  const pool = new Pool({
    connectionString: databaseUrl(),
    max: Number(process.env.DATABASE_POOL_SIZE ?? 10),
    connectionTimeoutMillis: CONNECT_TIMEOUT_MS,
    idleTimeoutMillis: 30_000,
  });
  // A server restart kills idle connections; the pool drops them and opens new ones on the next query.
  pool.on("error", () => {});
  return { pool, db: drizzle(pool, { schema }) };
}

export function getHandle(): Handle {
  globalForDb.backplateDb ??= open();
  return globalForDb.backplateDb;
}

export function getDb(): Database {
  return getHandle().db;
}

export function getPool(): Pool {
  return getHandle().pool;
}
