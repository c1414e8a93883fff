import "server-only";
import { getPool } from "./client";

export type DatabaseHealth =
  | { ok: true; roundTripMs: number }
  | { ok: false; message: string };

/** Longest a health probe waits for PostgreSQL before it reports the database down. */
const PROBE_TIMEOUT_MS = 3_000;

/** One round trip (`SELECT 1`) timed on the server. */
export async function checkDatabase(): Promise<DatabaseHealth> {
  const started = performance.now();
  try {
    await Promise.race([
      getPool().query("SELECT 1"),
      new Promise((_, reject) => setTimeout(() => reject(new Error("timed out")), PROBE_TIMEOUT_MS)),
    ]);
    return { ok: true, roundTripMs: Math.round((performance.now() - started) * 100) / 100 };
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    return {
      ok: false,
      message: `PostgreSQL is not answering (${reason}). Start it with \`npm run db:start\` or check DATABASE_URL.`,
    };
  }
}
