import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { bytes } from './bytes';
import { jobs } from './jobs';
import { users } from './users';

/** A job's photos and PDFs: the bytes as uploaded, with the type their content was checked to be. */
export const attachments = pgTable(
  'attachments',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    filename: text('filename').notNull(),
    contentType: text('content_type').notNull(),
    size: integer('size').notNull(),
    content: bytes('content').notNull(),
    uploadedBy: integer('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('attachments_shop_idx').on(t.shopId), index('attachments_job_idx').on(t.jobId), check('attachments_size_check', sql`${t.size} >= 0`)],
);
