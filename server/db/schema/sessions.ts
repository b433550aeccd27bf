import { index, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** express-session's store: one row per session, pruned once expired. */
export const sessions = pgTable(
  'sessions',
  {
    sid: text('sid').primaryKey(),
    sess: jsonb('sess').$type<Record<string, unknown>>().notNull(),
    expire: timestamp('expire', { withTimezone: true }).notNull(),
  },
  (t) => [index('sessions_expire_idx').on(t.expire)],
);
