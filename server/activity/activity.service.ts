import type { ActivityEntry } from '../../shared/api/contract';
import type { Database } from '../db/client';
import { notFound } from '../http/app-error';
import { findJob } from '../jobs/jobs.repository';
import { listActivity } from './activity.repository';

/** How many entries one answer holds; the screen shows the recent past, not the whole history. */
const LIMIT = 200;

/** Recent activity, newest first, of one job or of the whole shop. */
export async function recentActivity(db: Database, jobId?: number): Promise<ActivityEntry[]> {
  if (jobId !== undefined && !(await findJob(db, jobId))) throw notFound(`Job ${jobId}`);
  const rows = await listActivity(db, { jobId, limit: LIMIT });
  return rows.map(({ userId, userName, at, ...entry }) => ({
    ...entry,
    at: at.toISOString(),
    user: userId === null || userName === null ? null : { id: userId, name: userName },
  }));
}
