import type { Router } from 'express';
import { jobParams } from '../../shared/api/contract';
import { labelsQuery } from '../../shared/api/label-contract';
import { requirePermission } from '../auth/require-permission';
import { requestOrigin } from '../http/request-origin';
import type { RouteContext } from '../http/route-context';
import { jobLabels } from './labels.service';

/** Panel labels: A4 sheets to print and stick on the panels, each with a QR code to its bench page. */
export function labelsRoutes(router: Router, { db, clock }: RouteContext): void {
  router.get('/jobs/:jobId/labels.pdf', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const file = await jobLabels(db, jobId, labelsQuery.parse(req.query), requestOrigin(req), clock());
    res.attachment(file.name).type(file.type).send(Buffer.from(file.bytes));
  });
}
