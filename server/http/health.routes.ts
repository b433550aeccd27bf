import { sql } from 'drizzle-orm';
import type { Router } from 'express';
import type { RouteContext } from './route-context';

/** For monitors: answers once the database answers. */
export function healthRoutes(router: Router, { db }: RouteContext): void {
  router.get('/health', async (_req, res) => {
    await db.execute(sql`select 1`);
    res.json({ ok: true });
  });
}
