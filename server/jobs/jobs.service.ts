import type { z } from 'zod';
import { jsonTooDeep, TOO_DEEP_MESSAGE } from '../../shared/model/json-depth';
import type { carcassCreateBody, JobDetail, jobCreateBody, JobSummary, jobUpdateBody, User } from '../../shared/api/contract';
import { DEFAULT_MATERIALS } from '../../shared/model/default-materials';
import { JOB_FORMAT, jobDocument, type Carcass, type JobDocument } from '../../shared/model/job-document';
import { parseJobDocument } from '../../shared/model/parse-job';
import { recordActivity } from '../activity/activity.repository';
import type { Database } from '../db/client';
import { carcassDraft, fromJobDocument, toCarcass, toJobDocument, toPanelRecords } from '../db/job-mapping';
import { AppError, invalidField, notFound, staleVersion } from '../http/app-error';
import { findNulText, NUL_MESSAGE } from '../http/nul-text';
import { nextDocumentId } from './document-ids';
import * as repo from './jobs.repository';
import { writableJob } from './writable-job';
import { liveMember, recordJobEvent } from '../live/job-events.repository';
import { refreshJobStatistics } from '../db/planner-statistics';

type Summary = NonNullable<Awaited<ReturnType<typeof repo.findJobSummary>>>;

function toSummary({ notes: _notes, updatedAt, ...row }: Summary): JobSummary {
  return { ...row, updatedAt: updatedAt.toISOString() };
}

/** The job's summary; 404 when there is no such job. */
export async function jobSummary(db: Database, jobId: number): Promise<JobSummary> {
  const row = await repo.findJobSummary(db, jobId);
  if (!row) throw notFound(`Job ${jobId}`);
  return toSummary(row);
}

/** The active or the archived jobs, most recently changed first. */
export async function listJobs(db: Database, archived: boolean): Promise<JobSummary[]> {
  return (await repo.listJobSummaries(db, archived)).map(toSummary);
}

async function jobRows(db: Database, jobId: number) {
  const rows = await repo.loadJobRows(db, jobId);
  if (!rows) throw notFound(`Job ${jobId}`);
  return rows;
}

/** A job with its materials, carcasses and panels, for the job page; its counts are those of the rows read. */
export async function jobDetail(db: Database, jobId: number): Promise<JobDetail> {
  const rows = await jobRows(db, jobId);
  const { materials, system, limits, carcasses } = toJobDocument(rows);
  const { id, name, client, notes, archived, version, updatedAt } = rows.job;
  return {
    job: { id, name, client, archived, version, carcassCount: rows.carcasses.length, panelCount: rows.panels.length, updatedAt: updatedAt.toISOString(), notes },
    materials,
    system,
    limits,
    carcasses,
    panels: toPanelRecords(rows),
  };
}

/** The job as a `borewright.job/1` document. */
export async function jobAsDocument(db: Database, jobId: number): Promise<JobDocument> {
  return toJobDocument(await jobRows(db, jobId));
}

/** Stores a validated document as a new job in one transaction, with its activity entry. */
async function storeJob(db: Database, actor: User, doc: JobDocument, action: string, details: Record<string, unknown> = {}) {
  const jobId = await db.transaction(async (tx) => {
    const id = await repo.insertJobDraft(tx, fromJobDocument(doc));
    await recordActivity(tx, { userId: actor.id, jobId: id, action, details: { name: doc.name, ...details } });
    return id;
  });
  // A job of panels is a bulk load: the planner is told of it before the job is read (planner-statistics.ts).
  if (doc.panels.length > 0) await refreshJobStatistics(db);
  return jobSummary(db, jobId);
}

/** A new, empty job with the shop's default materials and the system and limit defaults. */
export function createJob(db: Database, actor: User, body: z.output<typeof jobCreateBody>): Promise<JobSummary> {
  const doc = jobDocument.parse({ format: JOB_FORMAT, ...body, materials: DEFAULT_MATERIALS });
  return storeJob(db, actor, doc, 'job.created');
}

/**
 * Reads an uploaded file as a job document. Every problem comes back at once, one line each, led
 * by its path, so the user can mend the file in one go.
 */
export function readJobFile(bytes: Buffer): JobDocument {
  const text = bytes.toString('utf8').replace(/^\uFEFF/, '');
  if (jsonTooDeep(text)) throw invalidDocument([`the file ${TOO_DEEP_MESSAGE}`]);
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (err) {
    throw invalidDocument([`the file is not JSON: ${(err as Error).message}`]);
  }
  const result = parseJobDocument(input);
  if (!result.ok) throw invalidDocument(result.errors);
  const nul = findNulText(result.value);
  if (nul !== undefined) throw invalidDocument([`${nul}: ${NUL_MESSAGE}`]);
  return result.value;
}

function invalidDocument(details: string[]): AppError {
  const count = details.length === 1 ? 'one problem' : `${details.length} problems`;
  return new AppError(400, 'invalid-document', `The file is not a valid job document (${count}); nothing was imported.`, { details });
}

/** Stores an imported document as a new job: all of it or, on any failure, nothing. */
export function importJob(db: Database, actor: User, doc: JobDocument, fileName?: string): Promise<JobSummary> {
  return storeJob(db, actor, doc, 'job.imported', fileName ? { file: fileName } : {});
}

/**
 * Renames, re-notes, archives or unarchives a job at the version the client saw, with its activity
 * entry; someone else's change since then answers 409 rather than being written over.
 */
export async function updateJob(db: Database, actor: User, jobId: number, body: z.output<typeof jobUpdateBody>): Promise<JobSummary> {
  const { version, ...changes } = body;
  await db.transaction(async (tx) => {
    // Restoring is the one change an archived job takes; every other goes through the gate.
    const current = changes.archived === false ? await repo.findJob(tx, jobId) : await writableJob(tx, jobId);
    if (!current) throw notFound(`Job ${jobId}`);
    if (current.version !== version || !(await repo.updateJobAtVersion(tx, jobId, version, changes))) throw staleVersion('this job', current.version);
    const action = changes.archived === true ? 'job.archived' : changes.archived === false ? 'job.unarchived' : 'job.updated';
    await recordActivity(tx, { userId: actor.id, jobId, action, details: { fields: Object.keys(changes) } });
    await recordJobEvent(tx, jobId, 'job-changed', { version: version + 1, by: liveMember(actor) });
  });
  return jobSummary(db, jobId);
}

/** Adds a carcass; its material must be one of the job's, its id (given or made) unique in the job. */
export async function addCarcass(db: Database, actor: User, jobId: number, body: z.output<typeof carcassCreateBody>): Promise<Carcass> {
  return db.transaction(async (tx) => {
    const job = await writableJob(tx, jobId);
    if (!job.materials.some((m) => m.id === body.material)) {
      throw invalidField('material', `this job has no material with id "${body.material}"`);
    }
    const taken = new Set((await repo.carcassKeys(tx, jobId)).keys());
    if (body.id !== undefined && taken.has(body.id)) {
      throw new AppError(409, 'duplicate-id', `id: this job already has a carcass "${body.id}".`, { fields: { id: 'is already used in this job' } });
    }
    const row = await repo.insertCarcass(tx, jobId, carcassDraft({ ...body, id: body.id ?? nextDocumentId('carcass', taken) }));
    await repo.touchJob(tx, jobId);
    await recordActivity(tx, { userId: actor.id, jobId, action: 'carcass.created', details: { carcass: row.key, name: row.name } });
    await recordJobEvent(tx, jobId, 'job-changed', { version: job.version, by: liveMember(actor) });
    return toCarcass(row);
  });
}
