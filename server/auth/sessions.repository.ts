import { and, eq, gt, ne, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { sessions } from '../db/schema';

/**
 * Ends every stored session signed in as this member, but the one named `keep` (the request's own,
 * after a password reset). passport keeps the member's id at sess.passport.user (auth/request-types.ts).
 * Returns how many ended.
 */
export async function deleteSessionsOf(db: Database, userId: number, keep?: string): Promise<number> {
  const ofUser = sql`(${sessions.sess} #>> '{passport,user}') = ${String(userId)}`;
  const rows = await db
    .delete(sessions)
    .where(keep === undefined ? ofUser : and(ofUser, ne(sessions.sid, keep)))
    .returning({ sid: sessions.sid });
  return rows.length;
}

/** Whether the session `sid` is still stored, unexpired and signed in as this member (a long-lived stream asks). */
export async function sessionSignedInAs(db: Database, sid: string, userId: number): Promise<boolean> {
  const rows = await db
    .select({ sid: sessions.sid })
    .from(sessions)
    .where(and(eq(sessions.sid, sid), gt(sessions.expire, new Date()), sql`(${sessions.sess} #>> '{passport,user}') = ${String(userId)}`));
  return rows.length > 0;
}
