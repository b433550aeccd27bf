import type { AttachmentSummary, AttachmentType } from '../../shared/api/attachment-contract';
import type { User } from '../../shared/api/contract';
import { recordActivity } from '../activity/activity.repository';
import type { Database } from '../db/client';
import { notFound } from '../http/app-error';
import { findJob, touchJob } from '../jobs/jobs.repository';
import { writableJob } from '../jobs/writable-job';
import { attachmentType, nameForType } from './content-type';
import * as repo from './attachments.repository';

type SummaryRow = NonNullable<Awaited<ReturnType<typeof repo.findAttachmentSummary>>>;

function toSummary(row: SummaryRow): AttachmentSummary {
  return { ...row, contentType: row.contentType as AttachmentType, uploadedAt: row.uploadedAt.toISOString() };
}

async function requireJob(db: Database, jobId: number): Promise<void> {
  if (!(await findJob(db, jobId))) throw notFound(`Job ${jobId}`);
}

/** A job's attachments, oldest first, without their bytes. */
export async function listAttachments(db: Database, jobId: number): Promise<AttachmentSummary[]> {
  await requireJob(db, jobId);
  return (await repo.listAttachments(db, jobId)).map(toSummary);
}

/** An uploaded file as the route hands it over; `declaredType` is the client's claim, used only in messages. */
export interface UploadedFile {
  bytes: Buffer;
  fileName: string;
  declaredType: string;
}

/** Keeps a photo or PDF with the job, typed by its content, with an activity entry. */
export async function uploadAttachment(db: Database, actor: User, jobId: number, file: UploadedFile): Promise<AttachmentSummary> {
  const contentType = await attachmentType(file.bytes, file.fileName, file.declaredType);
  const filename = nameForType(file.fileName, contentType);
  const id = await db.transaction(async (tx) => {
    await writableJob(tx, jobId);
    const inserted = await repo.insertAttachment(tx, { jobId, filename, contentType, size: file.bytes.length, content: file.bytes, uploadedBy: actor.id });
    await touchJob(tx, jobId);
    const details = { attachment: inserted, file: filename, sentAs: file.fileName, type: contentType, size: file.bytes.length };
    await recordActivity(tx, { userId: actor.id, jobId, action: 'attachment.uploaded', details });
    return inserted;
  });
  return toSummary((await repo.findAttachmentSummary(db, id))!);
}

/** One attachment with its bytes; 404 when there is none. */
export async function attachmentForDownload(db: Database, id: number) {
  const row = await repo.findAttachment(db, id);
  if (!row) throw notFound(`Attachment ${id}`);
  // Rows kept before names followed the content get the same name on the way out.
  return { ...row, filename: nameForType(row.filename, row.contentType as AttachmentType) };
}

/** Removes an attachment from its job, with an activity entry. */
export async function deleteAttachment(db: Database, actor: User, id: number): Promise<void> {
  await db.transaction(async (tx) => {
    const found = await repo.findAttachmentSummary(tx, id);
    if (!found) throw notFound(`Attachment ${id}`);
    await writableJob(tx, found.jobId);
    const deleted = (await repo.deleteAttachment(tx, id))!;
    await touchJob(tx, deleted.jobId);
    await recordActivity(tx, { userId: actor.id, jobId: deleted.jobId, action: 'attachment.deleted', details: { attachment: id, file: deleted.filename } });
  });
}
