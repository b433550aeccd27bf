import { asc, count } from 'drizzle-orm';
import type { Database } from '../db/client';
import { shops } from '../db/schema';

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
