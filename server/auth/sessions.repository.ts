import { and, ne, sql } from 'drizzle-orm';
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
