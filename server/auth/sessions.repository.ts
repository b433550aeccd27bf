import { and, eq, gt, ne, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { preparedPerDatabase } from '../db/prepared';
import { sessions, shops, users } from '../db/schema';
import { accountColumns } from './users.repository';

/** The query of every signed-in request. */
const sessionRead = preparedPerDatabase((db) =>
  db
    .select({ sess: sessions.sess, account: accountColumns, shopStatus: shops.status })
    .from(sessions)
    .leftJoin(users, eq(users.id, sql`(${sessions.sess} #>> '{passport,user}')::integer`))
    // A suspended shop's sessions stop working at their next request (auth.service.ts usableUser).
    .leftJoin(shops, eq(shops.id, users.shopId))
    .where(and(eq(sessions.sid, sql.placeholder('sid')), gt(sessions.expire, sql.placeholder('now'))))
    .prepare('session_read'),
);

/**
 * A session that has not expired, with the account it is signed in as (null when it is not signed in, or
 * the account is gone): one round trip for what every signed-in request needs. passport keeps the member's
 * id at sess.passport.user (auth/request-types.ts).
 */
export async function findSession(db: Database, sid: string, now: Date) {
  const [row] = await sessionRead(db).execute({ sid, now: now.toISOString() });
  return row && { sess: row.sess, account: row.account && { ...row.account, shopStatus: row.shopStatus } };
}

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
