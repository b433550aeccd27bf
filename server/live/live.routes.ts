import type { Router } from 'express';
import { jobEventsQuery, jobParams, liveEventId } from '../../shared/api/contract';
import { requirePermission } from '../auth/require-permission';
import { invalidField, notFound } from '../http/app-error';
import type { RouteContext } from '../http/route-context';
import { findJobStamp } from '../jobs/jobs.repository';
import { findPanel } from '../panels/panels.repository';

/** The job's live stream (server-sent events): presence, panels saved, marked or planned, the job changed. */
export function liveRoutes(router: Router, { db, liveStreams }: RouteContext): void {
  router.get('/jobs/:jobId/events', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const query = jobEventsQuery.parse({ panel: req.query.panel, lastEventId: req.query.lastEventId });
    // A reconnecting EventSource sends the last id it saw as a header; a first connection may name one in the query.
    const header = req.get('Last-Event-ID');
    const parsedHeader = header === undefined ? undefined : liveEventId.safeParse(header.trim());
    if (parsedHeader && !parsedHeader.success) throw invalidField('Last-Event-ID', 'must be an event id');
    if (!(await findJobStamp(db, jobId))) throw notFound(`Job ${jobId}`);
    if (query.panel !== undefined && (await findPanel(db, query.panel))?.jobId !== jobId) throw notFound(`Panel ${query.panel} of job ${jobId}`);
    await liveStreams.stream(req, res, jobId, query.panel ?? null, parsedHeader?.data ?? query.lastEventId);
  });
}
