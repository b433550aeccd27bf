import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { PGlite, types, type Transaction } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import { jobEventsOver, type JobEvents } from '../live/job-events';
import { JOB_EVENTS_CHANNEL } from '../live/job-events.repository';
import { postgresListen } from '../live/postgres-listen';
import { migrationsApplied, readJournal } from './migrations-applied';
import { SCOPE_RESET, scopeStatements, scopeSwitch } from './shop-scope';
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
  client.query = ((text: string, params?: unknown[], options?: QueryOptions) => query(text, params, parsersDropped(options))) as PGlite['query'];
  return client;
}

type QueryOptions = Parameters<PGlite['query']>[2];

/** A query's options without drizzle's parsers, which PGlite already has (withoutQueryParsers). */
function parsersDropped(options: QueryOptions): QueryOptions {
  if (!options?.parsers) return options;
  const { parsers: _given, ...rest } = options;
  return rest;
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

/**
 * PGlite is one connection, so its role and shop setting are the connection's own (set for the session,
 * not per transaction) and are changed only when a query or transaction of another scope (shop-scope.ts)
 * comes: a request's queries then cost no transaction and no setting statements of their own, which had
 * tripled the cost of a small query. Queries and transactions go one at a time through `queue`, so that
 * nothing of another scope runs between a change of scope and the work it was made for; PGlite itself runs
 * them one at a time anyway. A transaction's work runs with the scope it was opened in.
 */
function shopScopedPglite(client: PGlite): PGlite {
  /** The statements that put the connection in the scope it is in; undefined when not known (at first, or after a failed change). */
  let connectionScope: string | undefined;
  let queue: Promise<unknown> = Promise.resolve();
  const inScope = <T>(work: () => Promise<T>): Promise<T> => {
    // Read now, in the caller's scope: the queue runs the work later, from another's.
    const wanted = scopeSwitch();
    const run = queue.then(async () => {
      if (wanted !== undefined && connectionScope !== wanted) {
        connectionScope = undefined;
        await client.exec(wanted);
        connectionScope = wanted;
      }
      return work();
    });
    queue = run.catch(() => undefined);
    return run;
  };
  return new Proxy(client, {
    get(target, property) {
      if (property === 'query') {
        return (...[text, params, options]: Parameters<PGlite['query']>) => inScope(() => target.query(text, params, parsersDropped(options)));
      }
      if (property === 'transaction') {
        return <T>(work: (tx: Transaction) => Promise<T>) => inScope(() => target.transaction(work));
      }
      const value: unknown = Reflect.get(target, property, target);
      return typeof value === 'function' ? value.bind(target) : value;
    },
  });
}

/**
 * A PostgreSQL pool whose connections, checked out in a shop's scope, take the app's role and the shop's
 * setting for as long as they are out, and give them back on release. drizzle checks out a connection
 * for each transaction and asks the pool for every other query.
 */
function shopScopedPool(pg: typeof import('pg').default, config: import('pg').PoolConfig): import('pg').Pool {
  class ShopScopedPool extends pg.Pool {
    // @ts-expect-error pg's overloads: drizzle calls connect() without a callback; with one, it is pg's own (its query()).
    override connect(callback?: (...args: unknown[]) => void) {
      if (callback) return super.connect(callback as never);
      return this.scopedConnect();
    }

    private async scopedConnect(): Promise<import('pg').PoolClient> {
      const connection = await super.connect();
      const scope = scopeStatements();
      if (!scope) return connection;
      try {
        await connection.query(scope);
      } catch (error) {
        connection.release(error as Error);
        throw error;
      }
      const release = connection.release.bind(connection);
      connection.release = (error?: Error | boolean) => {
        connection.release = release;
        if (error) return release(error);
        connection.query(SCOPE_RESET).then(() => release(), (resetError: Error) => release(resetError));
      };
      return connection;
    }

    // @ts-expect-error pg's overloads: drizzle calls query(config, values) and awaits it.
    override query(...args: Parameters<import('pg').Pool['query']>) {
      if (!scopeStatements() || typeof args[args.length - 1] === 'function') return (super.query as (...a: unknown[]) => unknown)(...args);
      return (async () => {
        const connection = await this.scopedConnect();
        try {
          return await (connection.query as (...a: unknown[]) => Promise<unknown>)(...args);
        } finally {
          connection.release();
        }
      })();
    }
  }
  return new ShopScopedPool(config) as unknown as import('pg').Pool;
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
    const pool = shopScopedPool(pg, { connectionString: target.url, max: 10 });
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
  const db = drizzlePglite({ client: shopScopedPglite(withoutQueryParsers(client)), schema });
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
