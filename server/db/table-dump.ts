import { readFileSync } from 'node:fs';
import { getTableName, sql, type SQL } from 'drizzle-orm';
import type { Database } from './client';
import { rowsOf } from './rows-of';
import { activity, attachments, bores, carcasses, jobs, mailTokens, outbox, panels, placements, shopFittings, shopSettings, shops, users } from './schema';

/**
 * Every table a backup holds, parents before children (the order a restore inserts them): the shops, their
 * data and settings, its invitation and reset links (an open invitation still works after a restore) and the
 * outbox. Left out are the transient tables: sessions (everyone signs in again) and the sign-in
 * throttle's counters and usual addresses, the mail requests' counters and the sign-ups waiting for
 * their link (request_counters, sign_ups), and what the live streams keep (job_events, job_presence,
 * pack_progress).
 */
const TABLES = [shops, users, shopFittings, shopSettings, jobs, carcasses, panels, placements, bores, activity, attachments, mailTokens, outbox];

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
  const [row] = await rowsOf<Record<string, T>>(db, query);
  return Object.values(row)[0];
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
      if (!Array.isArray(rows)) throw new RestoreError(`table ${name} is not a list of rows`);
      if (rows.length > 0) await insertRows(tx, table, rows);
      await tx.execute(sql`select setval(pg_get_serial_sequence(${name}, 'id'), coalesce(max(id), 0) + 1, false) from ${table}`);
    }
  });
}

type Table = (typeof TABLES)[number];

const insertAll = (db: Database, table: Table, rows: unknown[]) =>
  db.execute(sql`insert into ${table} select * from json_populate_recordset(null::${table}, ${JSON.stringify(rows)}::json)`);

/** The database's own words for a refused row: its message, never its detail, which lists the row's values. */
function refusal(err: unknown): string {
  const cause = (err as { cause?: { message?: unknown } }).cause;
  return typeof cause?.message === 'string' ? cause.message : (err as Error).message.split('\n')[0];
}

/**
 * A table's rows in one statement, inside a savepoint. When the database refuses them, the rows are
 * tried one by one, each in a savepoint of its own, to name the first that is refused: its table, its
 * place in the file and its id, with the database's reason.
 */
async function insertRows(tx: Database, table: Table, rows: unknown[]): Promise<void> {
  const done = await tx.transaction((sp) => insertAll(sp, table, rows)).then(
    () => true,
    () => false,
  );
  if (done) return;
  for (const [i, row] of rows.entries()) {
    await tx.transaction((sp) => insertAll(sp, table, [row])).catch((err: unknown) => {
      const id = (row as { id?: unknown } | null)?.id;
      throw new RestoreError(`table ${getTableName(table)}, row ${i + 1}${id === undefined ? '' : ` (id ${JSON.stringify(id)})`}: ${refusal(err)}`);
    });
  }
  throw new RestoreError(`table ${getTableName(table)}: its rows were refused together though each alone was accepted (two rows with one key?)`);
}
