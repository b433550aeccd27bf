import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, unique } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { panelRole, panelStatus, type PanelRole, type PanelStatus } from '../../../shared/model/job-document';
import { carcasses } from './carcasses';
import { jobs } from './jobs';
import { oneOf } from './check';
import { users } from './users';

/** The hang relation of a door or flap, by panel ids of the document (design.md §3). */
export type HangColumn = { on: string[]; dy: number };

export const panels = pgTable(
  'panels',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    /** The panel's id inside the job document. */
    key: text('key').notNull(),
    carcassId: integer('carcass_id').references(() => carcasses.id, { onDelete: 'set null' }),
    name: text('name').notNull(),
    role: text('role').$type<PanelRole>().notNull(),
    width: doublePrecision('width').notNull(),
    height: doublePrecision('height').notNull(),
    thickness: doublePrecision('thickness').notNull(),
    material: text('material').notNull(),
    status: text('status').$type<PanelStatus>().notNull().default('planned'),
    /** Who set the status last and when; null while the panel is as planned. */
    statusBy: integer('status_by').references(() => users.id, { onDelete: 'set null' }),
    statusAt: timestamp('status_at', { withTimezone: true }),
    hang: jsonb('hang').$type<HangColumn>(),
    handleMass: doublePrecision('handle_mass'),
    /** Optimistic concurrency: every change bumps it; a write naming an older one is refused. */
    version: integer('version').notNull().default(1),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('panels_shop_idx').on(t.shopId),
    unique('panels_job_key_unique').on(t.jobId, t.key),
    index('panels_carcass_idx').on(t.carcassId),
    check('panels_role_check', oneOf(t.role, panelRole.options)),
    check('panels_status_check', oneOf(t.status, panelStatus.options)),
    check('panels_version_check', sql`${t.version} >= 1`),
  ],
);
