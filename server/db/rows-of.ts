import type { SQL } from 'drizzle-orm';
import type { Database } from './client';

/** Raw rows: execute answers the driver's own result, which holds them as `rows` on PGlite and on pg alike. */
export async function rowsOf<T>(db: Database, query: SQL): Promise<T[]> {
  return ((await db.execute(query)) as unknown as { rows: T[] }).rows;
}
