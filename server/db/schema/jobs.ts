import { boolean, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import type { Material, ShopLimits, SystemSettings } from '../../../shared/model/job-document';

/**
 * One job. Its settings and materials are small, read whole and never queried by field, so they
 * are jsonb; carcasses, panels, placements and bores have tables of their own.
 */
export const jobs = pgTable('jobs', {
  id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
  name: text('name').notNull(),
  client: text('client'),
  notes: text('notes'),
  archived: boolean('archived').notNull().default(false),
  system: jsonb('system').$type<SystemSettings>().notNull(),
  limits: jsonb('limits').$type<ShopLimits>().notNull(),
  materials: jsonb('materials').$type<Material[]>().notNull(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
