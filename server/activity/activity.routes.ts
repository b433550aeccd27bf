import type { Router } from 'express';
import { activityQuery } from '../../shared/api/contract';
import { requirePermission } from '../auth/require-permission';
import type { RouteContext } from '../http/route-context';
import { recentActivity } from './activity.service';

/** GET /activity: the recent activity of the shop or of one job, for those who edit jobs. */
export function activityRoutes(router: Router, { db }: RouteContext): void {
  router.get('/activity', requirePermission('editJobs'), async (req, res) => {
    const { jobId } = activityQuery.parse(req.query);
    res.json({ entries: await recentActivity(db, jobId) });
  });
}
