import type { Database } from './client';

/**
 * A query built and prepared once per database, for the queries every request runs: drizzle then skips
 * building its SQL each time (and PostgreSQL, given the name, plans it once per connection).
 */
export function preparedPerDatabase<T>(prepare: (db: Database) => T): (db: Database) => T {
  const kept = new WeakMap<Database, T>();
  return (db) => {
    let query = kept.get(db);
    if (query === undefined) kept.set(db, (query = prepare(db)));
    return query;
  };
}
