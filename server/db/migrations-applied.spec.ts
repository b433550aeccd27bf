import { fileURLToPath } from 'node:url';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, type DatabaseHandle } from './client';
import { migrationsApplied, readJournal } from './migrations-applied';

const journal = readJournal(fileURLToPath(new URL('./migrations', import.meta.url)));
const newest = Math.max(...journal.entries.map((e) => e.when));

describe('migrationsApplied', () => {
  let handle: DatabaseHandle;
  beforeAll(async () => {
    handle = await openDatabase({ engine: 'pglite' });
  });
  afterAll(() => handle.close());

  it('says a new database needs the migrations, and one that ran them does not', async () => {
    expect(await migrationsApplied(handle.db, journal)).toBe(false);
    await handle.migrate();
    expect(await migrationsApplied(handle.db, journal)).toBe(true);
    // Every migration of the journal is recorded once: migrate() ran the migrator exactly as before.
    const recorded = (await handle.db.execute(sql`select count(*)::int as n from drizzle.__drizzle_migrations`)) as unknown as { rows: { n: number }[] };
    expect(recorded.rows[0].n).toBe(journal.entries.length);
  });

  it('says a database behind the journal needs the migrator: a newer migration committed, or its record missing', async () => {
    const later = { entries: [...journal.entries, { tag: '9999_later', when: newest + 1 }] };
    expect(await migrationsApplied(handle.db, later)).toBe(false);
    // The newest record removed: the database looks one migration behind, as after pulling a new one.
    await handle.db.execute(sql`delete from drizzle.__drizzle_migrations where created_at = ${newest}`);
    expect(await migrationsApplied(handle.db, journal)).toBe(false);
  });
});
