import { integer, jsonb, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import type { Fitting } from '../../../shared/catalog/fitting';
import { users } from './users';

/**
 * The shop's own fittings, imported beside the built-in catalog (design.md §4). The fitting is stored
 * as the catalog's JSON, validated by the same schema on the way in and again when read.
 */
export const shopFittings = pgTable(
  'shop_fittings',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    fittingId: text('fitting_id').notNull(),
    fitting: jsonb('fitting').$type<Fitting>().notNull(),
    createdBy: integer('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('shop_fittings_shop_fitting_id_unique').on(t.shopId, t.fittingId)],
);
