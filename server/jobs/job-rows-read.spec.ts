import { eq, inArray, sql } from 'drizzle-orm';
import { setImmediate } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateJob } from '../../shared/bench/generate-job';
import type { DatabaseHandle } from '../db/client';
import { bores, panels, users } from '../db/schema';
import { inShop } from '../db/shop-scope';
import { DEMO_SHOP_ID } from '../testing/test-app';
import { openTestDatabase } from '../testing/test-database';
import { loadJobRows, PANELS_A_SLICE, touchJob } from './jobs.repository';
import { importJob, jobAsDocument } from './jobs.service';

describe('reading a job of many panels, a slice of panels at a time', () => {
  let database: DatabaseHandle;
  let jobId: number;
  // 20 boxes of three panels: 60 panels, read in four slices.
  const job = generateJob(20);
  const inDemoShop = <T>(work: () => Promise<T>) => inShop(DEMO_SHOP_ID, work);

  beforeAll(async () => {
    database = await openTestDatabase('demo');
    const [designer] = await inDemoShop(() => database.db.select().from(users).where(eq(users.role, 'designer')));
    jobId = (await inDemoShop(() => importJob(database.db, designer, job))).id;
  });
  afterAll(() => database.close());

  it('gives back every panel with its bores and placements as imported', async () => {
    expect(job.panels.length).toBeGreaterThan(3 * PANELS_A_SLICE);
    const read = await inDemoShop(() => jobAsDocument(database.db, jobId));
    expect(read.panels.map((p) => p.id)).toEqual(job.panels.map((p) => p.id));
    for (const [i, panel] of read.panels.entries()) {
      expect(panel.bores).toEqual(job.panels[i].bores);
      expect(panel.placements.map((p) => [p.id, p.fitting, p.x, p.y])).toEqual(job.panels[i].placements.map((p) => [p.id, p.fitting, p.x, p.y]));
    }
  });

  it('never mixes the job before and after a change that lands between its slices', async () => {
    const { db } = database;
    // A change to the first panel and the last, as one saved edit: each read must see both or neither.
    const ends = await inDemoShop(() => db.select({ id: panels.id }).from(panels).where(inArray(panels.key, [job.panels[0].id, job.panels.at(-1)!.id])));
    const xOf = (rows: NonNullable<Awaited<ReturnType<typeof loadJobRows>>>) =>
      ends.map(({ id }) => rows.bores.filter((b) => b.panelId === id).map((b) => b.x ?? b.at));
    const before = xOf((await inDemoShop(() => loadJobRows(db, jobId)))!);

    const reading = inDemoShop(() => loadJobRows(db, jobId));
    // The read lets the event loop go after its first slice: the change lands there.
    await setImmediate();
    await inDemoShop(() =>
      db.transaction(async (tx) => {
        await tx.update(bores).set({ x: sql`${bores.x} + 1`, at: sql`${bores.at} + 1` }).where(inArray(bores.panelId, ends.map((e) => e.id)));
        await touchJob(tx, jobId);
      }),
    );
    const seen = xOf((await reading)!);
    const after = xOf((await inDemoShop(() => loadJobRows(db, jobId)))!);

    expect(after).not.toEqual(before);
    expect([before, after]).toContainEqual(seen);
  });
});
