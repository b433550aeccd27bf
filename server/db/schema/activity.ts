import { index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { jobs } from './jobs';
import { users } from './users';

/**
 * Who did what, when, to which job and panel. An entry outlives the panel it names: panel_id has
 * no foreign key, so the history of a deleted panel keeps its id (ids are never reused).
 */
export const activity = pgTable(
  'activity',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    userId: integer('user_id').references(() => users.id, { onDelete: 'set null' }),
    jobId: integer('job_id').references(() => jobs.id, { onDelete: 'cascade' }),
    panelId: integer('panel_id'),
    action: text('action').notNull(),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index('activity_shop_at_idx').on(t.shopId, t.at), index('activity_job_at_idx').on(t.jobId, t.at), index('activity_at_idx').on(t.at)],
);
