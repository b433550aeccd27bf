import { sql } from 'drizzle-orm';
import { check, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { oneOf } from './check';

export const shopStatuses = ['active', 'suspended'] as const;
export type ShopStatus = (typeof shopStatuses)[number];

/** A shop: everything people make in Borewright belongs to exactly one (server/db/README.md, Shops). */
export const shops = pgTable(
  'shops',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    name: text('name').notNull(),
    /** A suspended shop's members cannot sign in (set by the operator). */
    status: text('status').$type<ShopStatus>().notNull().default('active'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check('shops_status_check', oneOf(t.status, shopStatuses))],
);

/**
 * The shop a row belongs to, on every shop-owned table. It defaults to the transaction's
 * `borewright.shop_id` (set from the session by server/db/shop-scope.ts), so no insert names a shop
 * and none can be given one from a request; outside a shop's scope the default is null and the insert
 * fails. Row-level security compares the same setting on every read and write.
 */
export const shopIdColumn = () =>
  integer('shop_id')
    .notNull()
    .default(sql`nullif(current_setting('borewright.shop_id', true), '')::int`)
    .references(() => shops.id);
