import "server-only";
import { eq, sql } from "drizzle-orm";
import { getDb } from "./client";
import { rateLimits } from "./schema";

/**
 * Fixed-window counters in the rate_limits table. A counter whose window has passed starts again at 1, so nothing
 * needs sweeping; PostgreSQL does the check-and-increment in one statement, so concurrent app servers agree.
 */
export interface RateWindow {
  /** attempts allowed inside one window */
  max: number;
  /** window length, ms */
  windowMs: number;
}

/** Counts one attempt against `key` and returns the count inside the current window (1 for a fresh window). */
export async function countAttempt(key: string, window: RateWindow): Promise<number> {
  const seconds = window.windowMs / 1000;
  const rows = await getDb()
    .insert(rateLimits)
    .values({ key, count: 1, windowStartedAt: sql`now()` })
    .onConflictDoUpdate({
      target: rateLimits.key,
      set: {
        count: sql`case when ${rateLimits.windowStartedAt} < now() - make_interval(secs => ${seconds}) then 1 else ${rateLimits.count} + 1 end`,
        windowStartedAt: sql`case when ${rateLimits.windowStartedAt} < now() - make_interval(secs => ${seconds}) then now() else ${rateLimits.windowStartedAt} end`,
      },
    })
    .returning({ count: rateLimits.count });
  return rows[0].count;
}

/** Whether `key` has used up its attempts in the current window (does not count an attempt). */
export async function isLimited(key: string, window: RateWindow): Promise<boolean> {
  const seconds = window.windowMs / 1000;
  const rows = await getDb()
    .select({ count: rateLimits.count })
    .from(rateLimits)
    .where(sql`${rateLimits.key} = ${key} and ${rateLimits.windowStartedAt} >= now() - make_interval(secs => ${seconds})`)
    .limit(1);
  return (rows[0]?.count ?? 0) >= window.max;
}

export async function clearAttempts(key: string): Promise<void> {
  await getDb().delete(rateLimits).where(eq(rateLimits.key, key));
}
