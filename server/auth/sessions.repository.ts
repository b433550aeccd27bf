import { and, eq, gt, ne, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { sessions } from '../db/schema';
import { rowsOf } from '../db/rows-of';
import { inAnyScope } from '../db/shop-scope';
import type { ShopStatus } from '../db/schema/shops';
import type { Role } from '../../shared/api/contract';
import type { LengthUnit } from '../../shared/units/length-unit';

/** A row of `session_with_account` (migration 0014): the session, and its account's columns, null when there is none. */
type SessionRow = {
  sess: Record<string, unknown>;
  id: number | null;
  email: string;
  name: string;
  role: Role;
  units: LengthUnit;
  demo: boolean;
  active: boolean;
  shop_id: number;
  shop_status: ShopStatus;
};

/**
 * A session that has not expired, with the account it is signed in as (null when it is not signed in, or
 * the account is gone) and its shop's status: one round trip for what every signed-in request needs, the
 * query of every signed-in request. passport keeps the member's id at sess.passport.user
 * (auth/request-types.ts). The function runs as its owner, across shops, in whatever scope the connection
 * is in (db/shop-scope.ts `inAnyScope`).
 */
export async function findSession(db: Database, sid: string, now: Date) {
  const [row] = await inAnyScope(() => rowsOf<SessionRow>(db, sql`select * from session_with_account(${sid}, ${now.toISOString()})`));
  if (!row) return undefined;
  const { sess, id, email, name, role, units, demo, active, shop_id: shopId, shop_status: shopStatus } = row;
  return { sess, account: id === null ? null : { id, email, name, role, units, demo, active, shopId, shopStatus } };
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
