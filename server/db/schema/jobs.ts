import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import type { Material, ShopLimits, SystemSettings } from '../../../shared/model/job-document';

/**
 * One job. Its settings and materials are small, read whole and never queried by field, so they
 * are jsonb; carcasses, panels, placements and bores have tables of their own.
 */
export const jobs = pgTable(
  'jobs',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    name: text('name').notNull(),
    client: text('client'),
    notes: text('notes'),
    archived: boolean('archived').notNull().default(false),
    system: jsonb('system').$type<SystemSettings>().notNull(),
    limits: jsonb('limits').$type<ShopLimits>().notNull(),
    materials: jsonb('materials').$type<Material[]>().notNull(),
    /**
     * Bumped by every change to the job's own fields (name, client, notes, archived); a change naming
     * an older version is refused (409), as for panels. Changes to its panels leave it alone.
     */
    version: integer('version').notNull().default(1),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('jobs_shop_updated_idx').on(t.shopId, t.updatedAt), check('jobs_version_check', sql`${t.version} >= 1`)],
);
