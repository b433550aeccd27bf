import { index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { bytes } from './bytes';

export interface OutboxAttachmentRow {
  name: string;
  contentType: string;
  bytes: number;
}

/**
 * What the local mail catcher received (design.md §5): the summary an admin reads on the Outbox page,
 * and the message exactly as it arrived, from which an attachment is read back when asked for.
 */
export const outbox = pgTable(
  'outbox',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    sender: text('sender').notNull(),
    recipients: jsonb('recipients').$type<string[]>().notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    attachments: jsonb('attachments').$type<OutboxAttachmentRow[]>().notNull().default([]),
    raw: bytes('raw').notNull(),
  },
  (t) => [index('outbox_shop_at_idx').on(t.shopId, t.at)],
);
