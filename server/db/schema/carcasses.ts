import { check, doublePrecision, index, integer, jsonb, pgTable, text, unique } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { jobs } from './jobs';
import { oneOf } from './check';

export const carcasses = pgTable(
  'carcasses',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    /** The carcass's id inside the job document. */
    key: text('key').notNull(),
    name: text('name').notNull(),
    width: doublePrecision('width').notNull(),
    height: doublePrecision('height').notNull(),
    depth: doublePrecision('depth').notNull(),
    /** A material id of the job's materials. */
    material: text('material').notNull(),
    mounting: text('mounting').$type<'floor' | 'wall'>().notNull().default('floor'),
    /** The planner's description it was made from (the document's `plannedFrom`); null when drawn by hand. */
    plannedFrom: jsonb('planned_from').$type<Record<string, unknown>>(),
  },
  (t) => [index('carcasses_shop_idx').on(t.shopId), unique('carcasses_job_key_unique').on(t.jobId, t.key), check('carcasses_mounting_check', oneOf(t.mounting, ['floor', 'wall']))],
);
