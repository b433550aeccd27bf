import { asc, eq } from 'drizzle-orm';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { attachments, users } from '../db/schema';

export type AttachmentDraft = Omit<typeof attachments.$inferInsert, 'id' | 'uploadedAt'>;

/** The columns a list shows: everything but the bytes, with the uploader's name. */
const summaryColumns = {
  id: attachments.id,
  jobId: attachments.jobId,
  filename: attachments.filename,
  contentType: attachments.contentType,
  size: attachments.size,
  uploadedBy: users.name,
  uploadedAt: attachments.uploadedAt,
};

export function listAttachments(db: Database, jobId: number) {
  return db.select(summaryColumns).from(attachments).leftJoin(users, eq(users.id, attachments.uploadedBy)).where(inOwnShop(attachments, eq(attachments.jobId, jobId))).orderBy(asc(attachments.id));
}

export async function findAttachmentSummary(db: Database, id: number) {
  const [row] = await db.select(summaryColumns).from(attachments).leftJoin(users, eq(users.id, attachments.uploadedBy)).where(inOwnShop(attachments, eq(attachments.id, id)));
  return row;
}

/** One attachment with its bytes, for a download. */
export async function findAttachment(db: Database, id: number) {
  const [row] = await db.select().from(attachments).where(inOwnShop(attachments, eq(attachments.id, id)));
  return row;
}

export async function insertAttachment(db: Database, draft: AttachmentDraft): Promise<number> {
  const [{ id }] = await db.insert(attachments).values(draft).returning({ id: attachments.id });
  return id;
}

/** Deletes one attachment; answers what it deleted, or undefined when there was none. */
export async function deleteAttachment(db: Database, id: number) {
  const [row] = await db.delete(attachments).where(inOwnShop(attachments, eq(attachments.id, id))).returning({ jobId: attachments.jobId, filename: attachments.filename });
  return row;
}
