import { readFileSync } from 'node:fs';
import { sql } from 'drizzle-orm';
import type { Database } from './client';
import { rowsOf } from './rows-of';

/** The migrations drizzle-kit committed, each with the time it was generated (drizzle records that time as applied). */
export interface MigrationJournal {
  entries: readonly { tag: string; when: number }[];
}

export function readJournal(migrationsFolder: string): MigrationJournal {
  return JSON.parse(readFileSync(`${migrationsFolder}/meta/_journal.json`, 'utf8')) as MigrationJournal;
}

/**
 * Whether the database has applied every migration of the journal. Drizzle's migrator applies those newer
 * than the newest it recorded (`created_at` is the journal's `when`), so this asks the one thing it would
 * find out, without its DDL, its transaction and reading and hashing every SQL file on each start.
 */
export async function migrationsApplied(db: Database, journal: MigrationJournal): Promise<boolean> {
  const newest = Math.max(...journal.entries.map((e) => e.when));
  // to_regclass gives null for a missing table instead of an error: a new database has no record yet.
  const [table] = await rowsOf<{ present: boolean }>(db, sql`select to_regclass('drizzle.__drizzle_migrations') is not null as present`);
  if (!table.present) return false;
  const [last] = await rowsOf<{ applied: string | number | null }>(db, sql`select max(created_at) as applied from drizzle.__drizzle_migrations`);
  // bigint arrives as a number from PGlite and as a string from pg.
  return last.applied !== null && Number(last.applied) >= newest;
}
