import type { Router } from 'express';
import { pipeline } from 'node:stream/promises';
import { jobParams } from '../../shared/api/contract';
import { retrofitQuery, swapApplyBody, swapQuery } from '../../shared/api/swap-contract';
import { requirePermission } from '../auth/require-permission';
import { packZipStream } from '../export/pack-zip';
import { jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as swap from './swap.service';

/**
 * The swap check: its report and retrofit pack for everyone who reads jobs (a bench hand and an installer
 * need to know what a substitute fitting does to panels drilled already), applying it for those who edit.
 */
export function swapRoutes(router: Router, { db, clock }: RouteContext): void {
  router.get('/jobs/:jobId/swap', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const { from, to } = swapQuery.parse(req.query);
    res.json(await swap.swapReportFor(db, jobId, from, to));
  });

  router.get('/jobs/:jobId/swap/retrofit.zip', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const { from, to, paper } = retrofitQuery.parse(req.query);
    const date = clock();
    const { pack, fileName } = await swap.retrofitPack(db, jobId, from, to, paper, date);
    res.attachment(fileName).type('application/zip');
    await pipeline(packZipStream(pack, date), res);
  });

  router.post('/jobs/:jobId/swap', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.json(await swap.applySwapTo(db, req.user!, jobId, swapApplyBody.parse(req.body)));
  });
}
