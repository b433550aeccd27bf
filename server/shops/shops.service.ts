import { sql } from 'drizzle-orm';
import { recordActivity } from '../activity/activity.repository';
import type { Database } from '../db/client';
import { enterShopStatements } from '../db/shop-scope';
import * as team from '../team/team.repository';
import { insertShop } from './shops.repository';

export interface NewShop {
  name: string;
  admin: { email: string; name: string; passwordHash: string };
  /** Who made it, for the activity entry: "sign-up" or "command line". */
  via: string;
}

/**
 * Makes a shop and its first admin in the caller's transaction, which must have been opened across shops
 * (the app's role may not insert shops): the shop's row first, then the rest of the transaction runs as
 * the new shop, its member and activity entry landing there by the column defaults and under its
 * row-level policies. Returns the shop's id and the admin as stored.
 */
export async function createShopWithAdmin(tx: Database, shop: NewShop) {
  const shopId = await insertShop(tx, shop.name);
  for (const statement of enterShopStatements(shopId)) await tx.execute(sql.raw(statement));
  const admin = await team.insertMember(tx, { ...shop.admin, role: 'admin' });
  await recordActivity(tx, { userId: null, action: 'shop.created', details: { shop: shopId, name: shop.name, admin: admin.id, email: admin.email, via: shop.via } });
  return { shopId, admin };
}
