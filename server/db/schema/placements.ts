import { boolean, check, doublePrecision, index, integer, jsonb, pgTable, text, unique } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { sql } from 'drizzle-orm';
import { face, type Face, type Rotation } from '../../../shared/model/job-document';
import { panels } from './panels';
import { oneOf } from './check';

export const placements = pgTable(
  'placements',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    panelId: integer('panel_id')
      .notNull()
      .references(() => panels.id, { onDelete: 'cascade' }),
    key: text('key').notNull(),
    /** A fitting id of the catalog; indexed for the swap check ("which panels use fitting X"). */
    fitting: text('fitting').notNull(),
    x: doublePrecision('x').notNull(),
    y: doublePrecision('y').notNull(),
    face: text('face').$type<Face>().notNull(),
    rotation: integer('rotation').$type<Rotation>().notNull().default(0),
    mirrored: boolean('mirrored'),
    params: jsonb('params').$type<Record<string, number>>(),
  },
  (t) => [
    index('placements_shop_idx').on(t.shopId),
    unique('placements_panel_key_unique').on(t.panelId, t.key),
    index('placements_fitting_idx').on(t.fitting),
    check('placements_face_check', oneOf(t.face, face.options)),
    check('placements_rotation_check', sql`${t.rotation} in (0, 90, 180, 270)`),
  ],
);
