import { desc, eq, getTableColumns } from 'drizzle-orm';
import type { Database } from '../db/client';
import { inOwnShop, ownShop } from '../db/own-shop';
import { outbox } from '../db/schema';

export type OutboxDraft = Omit<typeof outbox.$inferInsert, 'id' | 'at'>;

/** Keeps one message the catcher received. */
export async function insertOutboxMessage(db: Database, message: OutboxDraft): Promise<void> {
  await db.insert(outbox).values(message);
}

/** The latest messages, newest first, without their raw bytes. */
export function listOutbox(db: Database, limit: number) {
  const { raw: _raw, shopId: _shop, ...summary } = getTableColumns(outbox);
  return db.select(summary).from(outbox).where(ownShop(outbox)).orderBy(desc(outbox.at), desc(outbox.id)).limit(limit);
}

/** One message as it arrived, with the summary of its attachments. */
export async function findOutboxRaw(db: Database, id: number) {
  const [row] = await db.select({ raw: outbox.raw, attachments: outbox.attachments }).from(outbox).where(inOwnShop(outbox, eq(outbox.id, id)));
  return row;
}
