import { bigint, index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { jobs } from './jobs';
import { shopIdColumn } from './shops';
import { users } from './users';

/**
 * A short log of what happened on each job, for the live streams (server/live/): every server reads
 * an event from here when told its id (NOTIFY), and a reconnecting browser is replayed the events
 * after the last id it saw. The ids only grow; old events are pruned (job-events.repository.ts).
 */
export const jobEvents = pgTable(
  'job_events',
  {
    id: bigint('id', { mode: 'number' }).primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    kind: text('kind').notNull(),
    data: jsonb('data').$type<Record<string, unknown>>().notNull(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('job_events_job_idx').on(t.jobId, t.id), index('job_events_at_idx').on(t.at), index('job_events_shop_idx').on(t.shopId)],
);

/**
 * Who has a job (and which panel) open: one row per open live stream, on whichever server it is.
 * `seenAt` moves with the stream's heartbeat; a row not seen for a while is a stream whose server
 * went away, and counts no more.
 */
export const jobPresence = pgTable(
  'job_presence',
  {
    stream: text('stream').primaryKey(),
    shopId: shopIdColumn(),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    /** The panel open in the editor; null on the job page or the bench. */
    panelId: integer('panel_id'),
    seenAt: timestamp('seen_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('job_presence_job_idx').on(t.jobId), index('job_presence_shop_idx').on(t.shopId)],
);

/**
 * How far each pack being made has got, by its download's ticket, so any server can answer a poll. The
 * ticket names no job, so a row's shop is the shop that started the pack (the scope's, by default).
 */
export const packProgress = pgTable(
  'pack_progress',
  {
    ticket: text('ticket').primaryKey(),
    shopId: shopIdColumn(),
    panel: integer('panel').notNull(),
    panels: integer('panels').notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('pack_progress_shop_idx').on(t.shopId)],
);
