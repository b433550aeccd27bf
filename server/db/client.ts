import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import { migrationsApplied, readJournal } from './migrations-applied';
import { SCOPE_RESET, scopeStatements } from './shop-scope';
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
  /** PGlite only: the data folder as a tarball, to start other in-memory databases from (test templates). */
  dumpDataDir?(): Promise<Uint8Array>;
  close(): Promise<void>;
}

const migrationsFolder = fileURLToPath(new URL('./migrations', import.meta.url));

/** Runs the migrator only when the journal holds a migration the database has not applied. */
async function migrateWhenBehind(db: Database, migrator: () => Promise<void>): Promise<void> {
  if (!(await migrationsApplied(db, readJournal(migrationsFolder)))) await migrator();
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
 * PGlite is one connection: a query in a shop's scope (shop-scope.ts) runs in a transaction of its own
 * that first takes the app's role and the shop's setting, and a transaction takes them as it opens.
 * PGlite holds other queries back while a transaction runs, so no other scope's query slips in.
 */
function shopScopedPglite(client: PGlite): PGlite {
  return new Proxy(client, {
    get(target, property) {
      if (property === 'query') {
        return (...args: Parameters<PGlite['query']>) => {
          const scope = scopeStatements('transaction');
          if (!scope) return target.query(...args);
          return target.transaction(async (tx) => {
            await tx.exec(scope);
            return tx.query(...args);
          });
        };
      }
      if (property === 'transaction') {
        return <T>(work: Parameters<PGlite['transaction']>[0]) => {
          const scope = scopeStatements('transaction');
          return target.transaction(async (tx) => {
            if (scope) await tx.exec(scope);
            return work(tx) as T;
          });
        };
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
      const scope = scopeStatements('session');
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
      if (!scopeStatements('session') || typeof args[args.length - 1] === 'function') return (super.query as (...a: unknown[]) => unknown)(...args);
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
    return {
      db,
      engine: 'postgres',
      migrate: () => migrateWhenBehind(db, () => migratePostgres(db, { migrationsFolder })),
      close: () => pool.end(),
    };
  }
  // PGlite creates its own folder but not the ones above it.
  if (target.dataDir) mkdirSync(path.dirname(target.dataDir), { recursive: true });
  const client = await PGlite.create({
    dataDir: target.dataDir,
    loadDataDir: target.template ? new Blob([target.template]) : undefined,
  });
  const db = drizzlePglite({ client: shopScopedPglite(client), schema });
  return {
    db,
    engine: 'pglite',
    migrate: () => migrateWhenBehind(db, () => migratePglite(db, { migrationsFolder })),
    dumpDataDir: async () => new Uint8Array(await (await client.dumpDataDir('none')).arrayBuffer()),
    close: () => client.close(),
  };
}
