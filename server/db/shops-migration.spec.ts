import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { sql } from 'drizzle-orm';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openTestDatabase } from '../testing/test-database';
import { openDatabase, type DatabaseHandle } from './client';
import { dumpTables, type Backup } from './table-dump';

const migrationsFolder = fileURLToPath(new URL('./migrations', import.meta.url));
const rowsOf = async (handle: DatabaseHandle, query: ReturnType<typeof sql>) => ((await handle.db.execute(query)) as unknown as { rows: Record<string, unknown>[] }).rows;

/** The migrations folder as it stood at 0008 (the last migration before shops). */
function folderAt0008(): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'borewright-0008-'));
  cpSync(migrationsFolder, dir, { recursive: true });
  const journalFile = path.join(dir, 'meta', '_journal.json');
  const journal = JSON.parse(readFileSync(journalFile, 'utf8')) as { entries: { idx: number }[] };
  journal.entries = journal.entries.filter((e) => e.idx <= 8);
  writeFileSync(journalFile, JSON.stringify(journal));
  return dir;
}

/**
 * An installation of one shop, made before shops existed, keeps every row when it migrates: the demo
 * shop's rows (people, jobs down to bores, activity, outbox) are loaded into a database migrated to 0008,
 * then the migrations up to now run over them.
 */
describe('migration 0009: one shop from a single-shop database', () => {
  let demo: Backup;
  let old: DatabaseHandle;
  let folder: string;

  beforeAll(async () => {
    const template = await openTestDatabase('demo');
    demo = await dumpTables(template.db, new Date());
    await template.close();
    folder = folderAt0008();
    old = await openDatabase({ engine: 'pglite' });
    await migrate(old.db as Parameters<typeof migrate>[0], { migrationsFolder: folder });
    // The 0008 tables take the rows as they were then: json_populate_recordset ignores the later shop_id.
    for (const [table, rows] of Object.entries(demo.tables)) {
      if (table === 'shops' || rows.length === 0) continue;
      await old.db.execute(sql`insert into ${sql.identifier(table)} select * from json_populate_recordset(null::${sql.identifier(table)}, ${JSON.stringify(rows)}::json)`);
    }
    await old.migrate();
  }, 120_000);
  afterAll(async () => {
    await old?.close();
    if (folder) rmSync(folder, { recursive: true, force: true });
  });

  it('started from a database without shops that held the demo rows', () => {
    expect(demo.tables['jobs'].length).toBe(3);
    expect(demo.tables['bores'].length + demo.tables['placements'].length).toBeGreaterThan(0);
  });

  it('makes one shop, "Workshop", and puts every row of every table in it', async () => {
    const shops = await rowsOf(old, sql`select id, name, status from shops`);
    expect(shops).toEqual([{ id: 1, name: 'Workshop', status: 'active' }]);
    for (const table of Object.keys(demo.tables).filter((t) => t !== 'shops')) {
      const [{ n, outside }] = await rowsOf(old, sql`select count(*)::int as n, count(*) filter (where shop_id is distinct from 1)::int as outside from ${sql.identifier(table)}`);
      expect({ table, n, outside }).toEqual({ table, n: demo.tables[table].length, outside: 0 });
    }
  });

  it('keeps every row as it was, column for column', async () => {
    const after = await dumpTables(old.db, new Date());
    for (const [table, rows] of Object.entries(demo.tables)) {
      if (table === 'shops') continue;
      const withoutShop = (list: unknown[]) => list.map((row) => ({ ...(row as Record<string, unknown>), shop_id: undefined }));
      expect(withoutShop(after.tables[table]), table).toEqual(withoutShop(rows));
    }
  });

  it('then refuses a row with no shop', async () => {
    await expect(old.db.execute(sql`insert into jobs (name, system, limits, materials) values ('No shop', '{}', '{}', '[]')`)).rejects.toThrow();
  });
});
