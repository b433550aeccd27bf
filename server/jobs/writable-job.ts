import type { Database } from '../db/client';
import { AppError, notFound } from '../http/app-error';
import { lockJob } from './jobs.repository';

/**
 * The one gate of every write to a job or anything below it (its carcasses, panels and their drilling,
 * status marks, cut lists, attachments, swaps): the job's row, locked for the transaction, or 404 when
 * there is none and 409 `job-archived` when it is archived. An archived job is a record of what was made;
 * restoring it (PATCH /api/jobs/:jobId with `archived: false`) is the one change it takes.
 */
export async function writableJob(tx: Database, jobId: number) {
  const job = await lockJob(tx, jobId);
  if (!job) throw notFound(`Job ${jobId}`);
  if (job.archived) {
    throw new AppError(409, 'job-archived', `“${job.name}” is archived, so it can be read but not changed: restore the job first, then make the change.`);
  }
  return job;
}
