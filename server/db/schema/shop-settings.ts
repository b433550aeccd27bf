import { sql } from 'drizzle-orm';
import { check, integer, jsonb, pgTable, timestamp } from 'drizzle-orm/pg-core';
import type { MachineSettings } from '../../../shared/export/machine-settings';
import { users } from './users';

/**
 * The shop's settings, one row (id 1) for the whole shop: its machine's conventions, which the drilling
 * programs follow. Stored as the shared schema's JSON, validated on the way in and again when read; no
 * row means the defaults (shared/export/machine-settings.ts).
 */
export const shopSettings = pgTable(
  'shop_settings',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    machine: jsonb('machine').$type<MachineSettings>().notNull(),
    updatedBy: integer('updated_by').references(() => users.id, { onDelete: 'set null' }),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check('shop_settings_one_row', sql`${t.id} = 1`)],
);
