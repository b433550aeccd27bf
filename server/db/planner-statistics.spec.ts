import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateJob } from '../../shared/bench/generate-job';
import { importJob } from '../jobs/jobs.service';
import { DEMO_SHOP_ID } from '../testing/test-app';
import { openTestDatabase } from '../testing/test-database';
import type { DatabaseHandle } from './client';
import { rowsOf } from './rows-of';
import { users } from './schema';
import { inShop } from './shop-scope';

describe("the planner's statistics of the job tables", () => {
  let database: DatabaseHandle;
  beforeAll(async () => {
    database = await openTestDatabase('demo');
  });
  afterAll(() => database.close());

  /** What the planner believes a table holds: pg_class.reltuples, which ANALYZE sets (PostgreSQL manual, pg_class). */
  const believed = async (table: string) => (await rowsOf<{ n: number }>(database.db, sql`select reltuples::int as n from pg_class where relname = ${table}`))[0].n;

  it('are brought up to date when a job of panels is imported, as after any bulk load', async () => {
    const { db } = database;
    const [designer] = await inShop(DEMO_SHOP_ID, () => db.select().from(users).where(eq(users.role, 'designer')));
    const before = await believed('bores');
    const job = generateJob(4);
    await inShop(DEMO_SHOP_ID, () => importJob(db, designer, job));
    const [{ n: stored }] = await rowsOf<{ n: number }>(db, sql`select count(*)::int as n from bores`);
    expect(stored).toBeGreaterThan(before);
    expect(await believed('bores')).toBe(stored);
  });
});
