import type { MailRecipient, OutboxMessage } from '../../shared/api/pack-contract';
import { listPeople } from '../auth/users.repository';
import type { Database } from '../db/client';
import { notFound } from '../http/app-error';
import { findOutboxRaw, listOutbox } from './outbox.repository';
import { parseMail } from './parse-mail';

/** How many messages the Outbox page lists: the recent ones; the catcher is for looking, not for archiving. */
const LIMIT = 100;

/** The latest messages the catcher received, newest first. */
export async function outboxMessages(db: Database): Promise<OutboxMessage[]> {
  return (await listOutbox(db, LIMIT)).map(({ at, ...message }) => ({ ...message, at: at.toISOString() }));
}

/** One attachment of a caught message, read back from the message as it arrived. */
export async function outboxAttachment(db: Database, id: number, index: number): Promise<{ name: string; contentType: string; content: Buffer }> {
  const row = await findOutboxRaw(db, id);
  if (!row) throw notFound(`Message ${id}`);
  if (index >= row.attachments.length) throw notFound(`Attachment ${index} of message ${id}`);
  const attachment = (await parseMail(row.raw)).attachments[index];
  return { name: row.attachments[index].name, contentType: attachment.contentType, content: attachment.content };
}

/** The shop's people, whom a pack can be sent to by name. */
export async function mailRecipients(db: Database): Promise<MailRecipient[]> {
  return listPeople(db);
}
