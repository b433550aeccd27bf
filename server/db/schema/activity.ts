import { index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { jobs } from './jobs';
import { panels } from './panels';
import { users } from './users';

/** Who did what, when, to which job and panel. Entries outlive the panels and people they name. */
export const activity = pgTable(
  'activity',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    userId: integer('user_id').references(() => users.id, { onDelete: 'set null' }),
    jobId: integer('job_id').references(() => jobs.id, { onDelete: 'cascade' }),
    panelId: integer('panel_id').references(() => panels.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index('activity_job_at_idx').on(t.jobId, t.at), index('activity_at_idx').on(t.at)],
);
