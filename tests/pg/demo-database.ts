import { sql } from 'drizzle-orm';
import { openDatabase, type DatabaseHandle } from '../../server/db/client';
import { seedDemoShop } from '../../server/demo/seed-demo';

/** The PostgreSQL test database, migrated, emptied and seeded with the demo shop again. */
export async function freshDemoDatabase(url: string): Promise<DatabaseHandle> {
  const database = await openDatabase({ engine: 'postgres', url });
  await database.migrate();
  await database.db.execute(sql`truncate shops, users, sessions, jobs, carcasses, panels, placements, bores, activity, job_events, job_presence, pack_progress restart identity cascade`);
  await seedDemoShop(database.db);
  return database;
}
