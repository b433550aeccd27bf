import { and, eq, sql, type SQL } from 'drizzle-orm';
import type { PgColumn } from 'drizzle-orm/pg-core';
import { currentShop } from './shop-scope';

/** A table whose rows belong to a shop (its `shop_id`, schema/shops.ts `shopIdColumn`). */
type ShopOwned = { shopId: PgColumn };

/**
 * The first wall (server/db/README.md, Scoping): every select, update and delete a repository makes on a
 * shop-owned table names the scope's shop with this condition, so the query is right on its own, even on
 * a connection that row-level security (the second wall) does not hold. As no shop (a request nobody is
 * signed in to) it matches no row. Across shops or outside any scope it throws: the few look-ups that must
 * run across shops name no shop and are listed in the README.
 *
 * Joins: the condition on the table the query starts from is enough for what is reached from it by its own
 * foreign keys (a panel's carcass, a row's member), as those are the same shop's; a table read for its own
 * rows is filtered itself. Inserts name no shop: `shop_id` defaults to the scope's setting, and
 * row-level security refuses any other.
 */
export function ownShop(table: ShopOwned): SQL {
  const shopId = scopeShop();
  return shopId === null ? sql`false` : eq(table.shopId, shopId);
}

/** The scope's shop, or null for no shop; a filter asked for across shops is a mistake. */
function scopeShop(): number | null {
  const shopId = currentShop();
  if (shopId === undefined) throw new Error('a shop filter asked for outside any shop');
  return shopId;
}

/** `ownShop(table)` and the query's own conditions (undefined ones left out). */
export function inOwnShop(table: ShopOwned, ...conditions: (SQL | undefined)[]): SQL {
  return and(ownShop(table), ...conditions)!;
}

/** The same condition in a query prepared once per database (prepared.ts); `ownShopParams` fills it in. */
export function ownShopPlaceholder(table: ShopOwned): SQL {
  return eq(table.shopId, sql.placeholder('shopId'));
}

/** A prepared query's values with the scope's shop for `ownShopPlaceholder` (null, as no shop: equal to no row). */
export function ownShopParams<T extends Record<string, unknown>>(values: T): T & { shopId: number | null } {
  return { ...values, shopId: scopeShop() };
}
