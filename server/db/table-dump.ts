import { readFileSync } from 'node:fs';
import { getTableName, sql, type SQL } from 'drizzle-orm';
import type { Database } from './client';
import { activity, attachments, bores, carcasses, jobs, panels, placements, shopFittings, users } from './schema';

/**
 * Every table a backup holds, parents before children (the order a restore inserts them). Sessions
 * and the single-use mail links are transient and left out: after a restore, invite again.
 */
const TABLES = [users, shopFittings, jobs, carcasses, panels, placements, bores, activity, attachments];

export const BACKUP_FORMAT = 'borewright.backup/1';

export interface Backup {
  format: typeof BACKUP_FORMAT;
  createdAt: string;
  /** The last migration of the schema the rows fit; a restore needs the same one. */
  schema: string;
  tables: Record<string, unknown[]>;
}

/** The tag of the newest committed migration, e.g. "0000_foundation". */
export function currentSchema(): string {
  const journal = JSON.parse(readFileSync(new URL('./migrations/meta/_journal.json', import.meta.url), 'utf8')) as {
    entries: { tag: string }[];
  };
  return journal.entries.at(-1)?.tag ?? 'none';
}

/** One row of one column; raw results differ between drivers, but both carry `rows`. */
async function single<T>(db: Database, query: SQL): Promise<T> {
  const result = (await db.execute(query)) as unknown as { rows: Record<string, T>[] };
  return Object.values(result.rows[0])[0];
}

/**
 * Every row of every table as JSON, made by the database itself (json_agg), so both engines write
 * the same text: timestamps with their offset, floats in their shortest exact form.
 */
export async function dumpTables(db: Database, createdAt: Date): Promise<Backup> {
  const tables: Backup['tables'] = {};
  for (const table of TABLES) {
    tables[getTableName(table)] = await single<unknown[]>(db, sql`select coalesce(json_agg(t order by t.id), '[]'::json) from ${table} t`);
  }
  return { format: BACKUP_FORMAT, createdAt: createdAt.toISOString(), schema: currentSchema(), tables };
}

/** A backup that cannot be restored here; the message says why. */
export class RestoreError extends Error {}

/**
 * Loads a backup into an empty, migrated database in one transaction: all of it or nothing. The
 * rows keep their ids, and each id sequence continues after the largest restored id.
 */
export async function restoreTables(db: Database, backup: Backup): Promise<void> {
  if (backup?.format !== BACKUP_FORMAT) throw new RestoreError(`not a Borewright backup (format should be "${BACKUP_FORMAT}")`);
  if (backup.schema !== currentSchema()) {
    throw new RestoreError(`the backup fits schema ${backup.schema}, this version of Borewright has ${currentSchema()}: restore it with the version that made it`);
  }
  await db.transaction(async (tx) => {
    for (const table of TABLES) {
      if ((await tx.$count(table)) > 0) throw new RestoreError(`the database is not empty (table ${getTableName(table)} has rows): restore into a new data folder or database`);
    }
    for (const table of TABLES) {
      const name = getTableName(table);
      const rows = backup.tables[name] ?? [];
      if (rows.length > 0) {
        await tx.execute(sql`insert into ${table} select * from json_populate_recordset(null::${table}, ${JSON.stringify(rows)}::json)`);
      }
      await tx.execute(sql`select setval(pg_get_serial_sequence(${name}, 'id'), coalesce(max(id), 0) + 1, false) from ${table}`);
    }
  });
}
