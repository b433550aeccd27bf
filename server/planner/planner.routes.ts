import type { Router } from 'express';
import { jobParams } from '../../shared/api/contract';
import { planQuery } from '../../shared/api/plan-contract';
import { requirePermission } from '../auth/require-permission';
import { jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as planner from './planner.service';

/** The carcass planner: plan a carcass from its description and add it, or plan it again, with its panels. */
export function plannerRoutes(router: Router, { db }: RouteContext): void {
  router.post('/jobs/:jobId/plan', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const { changed } = planQuery.parse(req.query);
    res.status(201).json(await planner.storePlannedCarcass(db, req.user!, jobId, req.body, changed));
  });
}
