import { check, doublePrecision, index, integer, pgTable, text, unique } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { sql } from 'drizzle-orm';
import { edge, face, type Edge, type Face } from '../../../shared/model/job-document';
import { panels } from './panels';
import { oneOf } from './check';

/**
 * Loose bores, face and edge in one table: a face bore has x, y and face; an edge bore has edge,
 * at and z. The check keeps each row one or the other.
 */
export const bores = pgTable(
  'bores',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    panelId: integer('panel_id')
      .notNull()
      .references(() => panels.id, { onDelete: 'cascade' }),
    key: text('key').notNull(),
    x: doublePrecision('x'),
    y: doublePrecision('y'),
    face: text('face').$type<Face>(),
    edge: text('edge').$type<Edge>(),
    at: doublePrecision('at'),
    z: doublePrecision('z'),
    diameter: doublePrecision('diameter').notNull(),
    depth: doublePrecision('depth').notNull(),
  },
  (t) => [
    index('bores_shop_idx').on(t.shopId),
    unique('bores_panel_key_unique').on(t.panelId, t.key),
    check('bores_face_check', oneOf(t.face, face.options)),
    check('bores_edge_check', oneOf(t.edge, edge.options)),
    check(
      'bores_kind_check',
      sql`(${t.edge} is null and ${t.x} is not null and ${t.y} is not null and ${t.face} is not null and ${t.at} is null and ${t.z} is null)
       or (${t.edge} is not null and ${t.at} is not null and ${t.z} is not null and ${t.x} is null and ${t.y} is null and ${t.face} is null)`,
    ),
  ],
);
