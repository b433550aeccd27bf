import { asc } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_SHOP_ID } from '../testing/test-app';
import { openTestDatabase } from '../testing/test-database';
import type { DatabaseHandle } from './client';
import { ownShop } from './own-shop';
import { selectAsJson } from './rows-as-json';
import { bores, panels, placements } from './schema';
import { inShop } from './shop-scope';

describe('rows read as JSON', () => {
  let database: DatabaseHandle;
  beforeAll(async () => {
    database = await openTestDatabase('demo');
  });
  afterAll(() => database.close());

  // drizzle's own select is the reference: the same rows, the same fields, the same values and types.
  it('gives the rows drizzle gives, in order, for the demo shop', async () => {
    const { db } = database;
    await inShop(DEMO_SHOP_ID, async () => {
      // The demo drills through its placements alone: some loose bores, on a face and in an edge. The first
      // one's depth needs all 17 digits, which come back exactly: PostgreSQL writes a double's shortest exact
      // digits (release notes of PostgreSQL 12).
      const [panel] = await db.select({ id: panels.id }).from(panels).where(ownShop(panels)).limit(1);
      await db.insert(bores).values([
        { panelId: panel.id, key: 'b1', x: 37, y: 9.5, face: 'A', diameter: 5, depth: 0.1 + 0.2 },
        ...Array.from({ length: 12 }, (_, i) => ({ panelId: panel.id, key: `e${i}`, edge: 'y1' as const, at: 32 * i + 0.25, z: 8, diameter: 8, depth: 30 })),
      ]);
      for (const table of [bores, placements]) {
        const expected = await db.select().from(table).where(ownShop(table)).orderBy(asc(table.id));
        expect(expected.length).toBeGreaterThan(10);
        expect(await selectAsJson(db, table, ownShop(table), table.id)).toStrictEqual(expected);
      }
      const [first] = await selectAsJson(db, bores, ownShop(bores), bores.id);
      expect(first.depth).toBe(0.30000000000000004);
    });
  });

  it('refuses a table with a column JSON would carry otherwise than drizzle reads it', async () => {
    await expect(inShop(DEMO_SHOP_ID, () => selectAsJson(database.db, panels, ownShop(panels), panels.id))).rejects.toThrow(/status_at is a PgTimestamp/);
  });
});
