import type { Router } from 'express';
import { jobParams } from '../../shared/api/contract';
import { requirePermission } from '../auth/require-permission';
import { jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as planner from './planner.service';

/** The carcass planner: plan a carcass from its description and add it with its panels to a job. */
export function plannerRoutes(router: Router, { db }: RouteContext): void {
  router.post('/jobs/:jobId/plan', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.status(201).json(await planner.addPlannedCarcass(db, req.user!, jobId, req.body));
  });
}
