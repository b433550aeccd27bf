import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sql } from 'drizzle-orm';
import { createJob, jobAsDocument, listJobs } from '../jobs/jobs.service';
import { DEMO_SHOP_ID } from '../testing/test-app';
import { openTestDatabase } from '../testing/test-database';
import { inShop } from './shop-scope';
import type { DatabaseHandle } from './client';
import { jobs, users } from './schema';
import { dumpTables, restoreTables, RestoreError, type Backup } from './table-dump';

describe('backup and restore', () => {
  let source: DatabaseHandle;
  let target: DatabaseHandle;
  let backup: Backup;
  beforeAll(async () => {
    [source, target] = await Promise.all([openTestDatabase('demo'), openTestDatabase('empty')]);
    const [owner] = await source.db.select().from(users).limit(1);
    await inShop(DEMO_SHOP_ID, () => createJob(source.db, { ...owner }, { name: 'Job with "quotes" and ünïcode <b>', client: 'O\'Brien' }));
    // Through JSON and back, as the file on disk would be.
    backup = JSON.parse(JSON.stringify(await dumpTables(source.db, new Date('2030-01-02T03:04:05Z'))));
  });
  afterAll(() => Promise.all([source.close(), target.close()]));

  it('restores into a fresh database the same rows, jobs and documents', async () => {
    await restoreTables(target.db, backup);
    expect(await dumpTables(target.db, new Date('2030-01-02T03:04:05Z'))).toEqual(backup);
    const jobList = await inShop(DEMO_SHOP_ID, () => listJobs(source.db, false));
    expect(await inShop(DEMO_SHOP_ID, () => listJobs(target.db, false))).toEqual(jobList);
    for (const { id } of jobList) expect(await inShop(DEMO_SHOP_ID, () => jobAsDocument(target.db, id))).toEqual(await inShop(DEMO_SHOP_ID, () => jobAsDocument(source.db, id)));
    // The demo shop is planned: its holes are placements of catalog fittings (shelf pins, plates, hinges, connectors).
    expect(backup.tables.placements.length).toBeGreaterThan(500);
  });

  it('continues every id after the restored ones', async () => {
    const [{ max }] = await target.db.select({ max: sql<number>`max(${jobs.id})` }).from(jobs);
    const [owner] = await target.db.select().from(users).limit(1);
    const created = await inShop(DEMO_SHOP_ID, () => createJob(target.db, owner, { name: 'After the restore' }));
    expect(created.id).toBe(max + 1);
  });

  it('names the table and the row the database refuses, never printing the rows, and restores nothing', async () => {
    const fresh = await openTestDatabase('empty');
    try {
      const panels = backup.tables.panels as { id: number; width: number; name: string }[];
      const bad = panels.map((p, i) => (i === 2 ? { ...p, width: null } : p));
      const attempt = restoreTables(fresh.db, { ...backup, tables: { ...backup.tables, panels: bad } });
      await expect(attempt).rejects.toThrow(RestoreError);
      const message = ((await attempt.catch((e: unknown) => e)) as Error).message;
      expect(message).toMatch(new RegExp(`^table panels, row 3 \\(id ${panels[2].id}\\): null value in column "width"`));
      // PostgreSQL's detail ("Failing row contains (…)") would list the row's values, its name among them.
      expect(message).not.toContain(panels[2].name);
      expect(message.length).toBeLessThan(300);
      const duplicate = restoreTables(fresh.db, { ...backup, tables: { ...backup.tables, jobs: [...backup.tables.jobs, backup.tables.jobs[0]] } });
      await expect(duplicate).rejects.toThrow(new RegExp(`^table jobs, row ${backup.tables.jobs.length + 1} \\(id 1\\): duplicate key value`));
      const notRows = restoreTables(fresh.db, { ...backup, tables: { ...backup.tables, bores: 'none' as unknown as unknown[] } });
      await expect(notRows).rejects.toThrow('table bores is not a list of rows');
      expect(await fresh.db.$count(jobs)).toBe(0);
    } finally {
      await fresh.close();
    }
  });

  it('holds the invitation and reset links and the outbox, and restores them', () => {
    expect(Object.keys(backup.tables)).toEqual(['shops', 'users', 'shop_fittings', 'shop_settings', 'jobs', 'carcasses', 'panels', 'placements', 'bores', 'activity', 'attachments', 'mail_tokens', 'outbox']);
  });

  it('refuses a database that already has rows, and a file of another kind', async () => {
    await expect(restoreTables(target.db, backup)).rejects.toThrow('the database is not empty');
    await expect(restoreTables(target.db, { ...backup, format: 'other' } as unknown as Backup)).rejects.toThrow('not a Borewright backup');
    await expect(restoreTables(target.db, { ...backup, schema: '9999_future' })).rejects.toThrow('schema 9999_future');
  });
});
