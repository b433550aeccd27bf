import { asc, count, eq, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { sessions, shops, users } from '../db/schema';
import type { ShopStatus } from '../db/schema/shops';

/**
 * The operator's queries on shops. They run as the connecting role, outside any shop's scope: the app's
 * role may read only its own shop's row and change none (migration 0010).
 */

/** Makes a shop and returns its id. */
export async function insertShop(db: Database, name: string): Promise<number> {
  const [row] = await db.insert(shops).values({ name }).returning({ id: shops.id });
  return row.id;
}

/** How many shops there are. */
export async function countShops(db: Database): Promise<number> {
  const [row] = await db.select({ n: count() }).from(shops);
  return row.n;
}

/** The shops, oldest first. */
export function listShops(db: Database) {
  return db.select().from(shops).orderBy(asc(shops.id));
}

export async function findShop(db: Database, id: number) {
  const [row] = await db.select().from(shops).where(eq(shops.id, id));
  return row;
}

/** The shops, oldest first, each with how many members it has (active or not). */
export function listShopsWithMembers(db: Database) {
  return db
    .select({ id: shops.id, name: shops.name, status: shops.status, createdAt: shops.createdAt, members: count(users.id) })
    .from(shops)
    .leftJoin(users, eq(users.shopId, shops.id))
    .groupBy(shops.id)
    .orderBy(asc(shops.id));
}

/** Sets a shop's status; false when there is no such shop. */
export async function setShopStatus(db: Database, id: number, status: ShopStatus): Promise<boolean> {
  const rows = await db.update(shops).set({ status }).where(eq(shops.id, id)).returning({ id: shops.id });
  return rows.length > 0;
}

/** Ends every stored session signed in as a member of the shop; returns how many ended. */
export async function deleteSessionsOfShop(db: Database, shopId: number): Promise<number> {
  const members = db.select({ id: sql`${users.id}::text` }).from(users).where(eq(users.shopId, shopId));
  const rows = await db
    .delete(sessions)
    .where(sql`(${sessions.sess} #>> '{passport,user}') in ${members}`)
    .returning({ sid: sessions.sid });
  return rows.length;
}
