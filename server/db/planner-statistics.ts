import { sql } from 'drizzle-orm';
import type { Database } from './client';
import { acrossShops } from './shop-scope';

/**
 * Refreshes the query planner's statistics of the job tables, as PostgreSQL's manual advises after a bulk
 * load ("Populating a Database": run ANALYZE afterwards). PGlite runs no autovacuum, so without this its
 * statistics stay those of an empty database: a 300-panel job's bores were then read through the shop's
 * index once per panel, twice as slow as with a plan that knows the tables' sizes. Runs as the tables'
 * owner (only an owner may analyze), reading nothing back; on a PostgreSQL server autovacuum does the same
 * sooner or later, and this only makes it sooner.
 */
export async function refreshJobStatistics(db: Database): Promise<void> {
  await acrossShops(() => db.execute(sql`analyze jobs, carcasses, panels, placements, bores`));
}
