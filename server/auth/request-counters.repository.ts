import { and, eq, like, lt, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { requestCounters } from '../db/schema';

/**
 * Counts one request under `key` in one statement: a new key, or one whose window has ended, starts a
 * window of its own at `now` with one request. Two servers counting the same key at once both get a
 * count that includes the other's.
 */
export async function countRequest(db: Database, key: string, now: Date, windowMs: number): Promise<{ hits: number; windowStart: Date }> {
  const ended = sql`${requestCounters.windowStart} <= ${new Date(now.getTime() - windowMs).toISOString()}::timestamptz`;
  const [row] = await db
    .insert(requestCounters)
    .values({ key, hits: 1, windowStart: now })
    .onConflictDoUpdate({
      target: requestCounters.key,
      set: {
        hits: sql`case when ${ended} then 1 else ${requestCounters.hits} + 1 end`,
        windowStart: sql`case when ${ended} then excluded.window_start else ${requestCounters.windowStart} end`,
      },
    })
    .returning({ hits: requestCounters.hits, windowStart: requestCounters.windowStart });
  return row;
}

/** Takes one request back (express-rate-limit's skipped requests); never below zero. */
export async function uncountRequest(db: Database, key: string): Promise<void> {
  await db
    .update(requestCounters)
    .set({ hits: sql`greatest(${requestCounters.hits} - 1, 0)` })
    .where(eq(requestCounters.key, key));
}

export async function deleteCounter(db: Database, key: string): Promise<void> {
  await db.delete(requestCounters).where(eq(requestCounters.key, key));
}

/** The counters under `prefix` whose window started before `before`: nothing reads them any more. */
export async function pruneCounters(db: Database, prefix: string, before: Date): Promise<void> {
  await db.delete(requestCounters).where(and(like(requestCounters.key, `${prefix}%`), lt(requestCounters.windowStart, before)));
}
