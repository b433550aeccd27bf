import { integer, jsonb, pgTable, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import type { MachineSettings } from '../../../shared/export/machine-settings';
import { users } from './users';

/**
 * A shop's settings, one row per shop: its machine's conventions, which the drilling
 * programs follow. Stored as the shared schema's JSON, validated on the way in and again when read; no
 * row means the defaults (shared/export/machine-settings.ts).
 */
export const shopSettings = pgTable(
  'shop_settings',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    machine: jsonb('machine').$type<MachineSettings>().notNull(),
    updatedBy: integer('updated_by').references(() => users.id, { onDelete: 'set null' }),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('shop_settings_shop_unique').on(t.shopId)],
);
