import type { Database } from '../db/client';
import { notFound } from '../http/app-error';
import { findJobStamp } from './jobs.repository';
import { jobDetail } from './jobs.service';

/** How many jobs' answers are kept, the most recently read ones. */
const KEPT_JOBS = 32;

/**
 * The job page's answer, made once per stored state of a job and kept serialized, and its entity tag.
 * The tag is the job's stamp (its version and the transaction that last wrote its row, which every change
 * to the job or its carcasses and panels writes), read from the database on every request: so a tag
 * never outlives a change, whichever server made it, and an answer is reused only for the state it was
 * made from.
 */
export class JobDetailReads {
  private readonly kept = new Map<number, { etag: string; body: Buffer }>();

  /** The job's current entity tag; 404 when there is no such job. */
  async etag(db: Database, jobId: number): Promise<string> {
    const stamp = await findJobStamp(db, jobId);
    if (!stamp) throw notFound(`Job ${jobId}`);
    return `W/"job-${jobId}-${stamp.version}-${stamp.writtenBy}-${stamp.updatedAt}"`;
  }

  /**
   * The answer as JSON for the state `etag` names. Made after the stamp was read, it is never older than
   * the tag: a change in between only makes it newer, and the next read's new tag then replaces it.
   */
  async body(db: Database, jobId: number, etag: string): Promise<Buffer> {
    const hit = this.kept.get(jobId);
    this.kept.delete(jobId);
    const body = hit?.etag === etag ? hit.body : Buffer.from(JSON.stringify(await jobDetail(db, jobId)));
    this.kept.set(jobId, { etag, body });
    if (this.kept.size > KEPT_JOBS) this.kept.delete(this.kept.keys().next().value!);
    return body;
  }
}
