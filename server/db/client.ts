import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { PGlite, types } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import { jobEventsOver, type JobEvents } from '../live/job-events';
import { JOB_EVENTS_CHANNEL } from '../live/job-events.repository';
import { postgresListen } from '../live/postgres-listen';
import { migrationsApplied, readJournal } from './migrations-applied';
import * as schema from './schema';

/**
 * The one place that knows which engine runs: PGlite in a data folder (or in memory, for tests),
 * or a PostgreSQL server when DATABASE_URL is set. Everything else sees `Database`.
 */
export type Database = PgDatabase<PgQueryResultHKT, typeof schema>;

export type DatabaseTarget =
  /** Without a dataDir the database lives in memory; `template` is a data folder tarball to start from. */
  | { engine: 'pglite'; dataDir?: string; template?: Uint8Array }
  | { engine: 'postgres'; url: string };

export interface DatabaseHandle {
  readonly db: Database;
  readonly engine: DatabaseTarget['engine'];
  /** Applies the committed migrations of server/db/migrations that this database has not seen (none: two queries). */
  migrate(): Promise<void>;
  /**
   * Word of each job's new events, from this server or any other on the same database
   * (server/live/): LISTEN on a connection of its own on PostgreSQL, PGlite's own listen on PGlite.
   * Nothing listens until the first subscription.
   */
  readonly jobEvents: JobEvents;
  /** PGlite only: the data folder as a tarball, to start other in-memory databases from (test templates). */
  dumpDataDir?(): Promise<Uint8Array>;
  close(): Promise<void>;
}

const migrationsFolder = fileURLToPath(new URL('./migrations', import.meta.url));

/** Runs the migrator only when the journal holds a migration the database has not applied. */
async function migrateWhenBehind(db: Database, migrator: () => Promise<void>): Promise<void> {
  if (!(await migrationsApplied(db, readJournal(migrationsFolder)))) await migrator();
}

/** The values drizzle reads as PostgreSQL's text (dates, intervals and their arrays), as drizzle's PGlite driver asks for them. */
const keepText = (value: string) => value;
const DRIZZLE_PARSERS = Object.fromEntries(
  [types.TIMESTAMP, types.TIMESTAMPTZ, types.INTERVAL, types.DATE, 1231, 1115, 1185, 1187, 1182].map((oid) => [oid, keepText]),
);

/**
 * drizzle passes those parsers with every query, and PGlite merges them into its own for each result:
 * a third of the time of a small query. Given once, to PGlite itself, the same values come back.
 */
function withoutQueryParsers(client: PGlite): PGlite {
  const query = client.query.bind(client);
  client.query = ((text: string, params?: unknown[], options?: { parsers?: unknown }) => {
    if (!options?.parsers) return query(text, params, options as never);
    const { parsers: _given, ...rest } = options;
    return query(text, params, rest as never);
  }) as PGlite['query'];
  return client;
}

/**
 * The target the configuration names: DATABASE_URL wins over the data folder. PGlite keeps its
 * files in a folder of their own inside the data folder, beside the lock and the session secret.
 */
export function databaseTarget(config: { databaseUrl?: string; dataDir: string }): DatabaseTarget {
  return config.databaseUrl
    ? { engine: 'postgres', url: config.databaseUrl }
    : { engine: 'pglite', dataDir: path.join(config.dataDir, 'pglite') };
}

/** Opens the database the target names. A PGlite data folder must be locked by the caller first (data-lock.ts). */
export async function openDatabase(target: DatabaseTarget): Promise<DatabaseHandle> {
  if (target.engine === 'postgres') {
    // Loaded only for a PostgreSQL server: a start on PGlite need not load pg.
    const [{ default: pg }, { drizzle: drizzlePostgres }, { migrate: migratePostgres }] = await Promise.all([
      import('pg'),
      import('drizzle-orm/node-postgres'),
      import('drizzle-orm/node-postgres/migrator'),
    ]);
    const pool = new pg.Pool({ connectionString: target.url, max: 10 });
    const db = drizzlePostgres({ client: pool, schema });
    const jobEvents = jobEventsOver(postgresListen(pg.Client, target.url));
    return {
      db,
      engine: 'postgres',
      jobEvents,
      migrate: () => migrateWhenBehind(db, () => migratePostgres(db, { migrationsFolder })),
      close: async () => {
        await jobEvents.close();
        await pool.end();
      },
    };
  }
  // PGlite creates its own folder but not the ones above it.
  if (target.dataDir) mkdirSync(path.dirname(target.dataDir), { recursive: true });
  const client = await PGlite.create({
    dataDir: target.dataDir,
    loadDataDir: target.template ? new Blob([target.template]) : undefined,
    parsers: DRIZZLE_PARSERS,
  });
  const db = drizzlePglite({ client: withoutQueryParsers(client), schema });
  // One process holds a PGlite database, so its notifications are this server's own.
  const jobEvents = jobEventsOver(async (onPayload) => client.listen(JOB_EVENTS_CHANNEL, onPayload));
  return {
    db,
    engine: 'pglite',
    jobEvents,
    migrate: () => migrateWhenBehind(db, () => migratePglite(db, { migrationsFolder })),
    dumpDataDir: async () => new Uint8Array(await (await client.dumpDataDir('none')).arrayBuffer()),
    close: async () => {
      await jobEvents.close();
      await client.close();
    },
  };
}
