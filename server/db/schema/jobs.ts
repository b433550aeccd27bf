import { sql } from 'drizzle-orm';
import { boolean, check, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import type { Material, ShopLimits, SystemSettings } from '../../../shared/model/job-document';

/**
 * One job. Its settings and materials are small, read whole and never queried by field, so they
 * are jsonb; carcasses, panels, placements and bores have tables of their own.
 */
export const jobs = pgTable(
  'jobs',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
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
  (t) => [check('jobs_version_check', sql`${t.version} >= 1`)],
);
