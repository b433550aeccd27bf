import { index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/**
 * Counters of requests that send mail to a typed address (password reset, sign-up), one row per key
 * (`reset-address:…`, `signup-account:…`): express-rate-limit's counts kept in the database
 * (auth/database-rate-store.ts), so two servers on one database count together. They belong to no shop.
 */
export const requestCounters = pgTable(
  'request_counters',
  {
    key: text('key').primaryKey(),
    hits: integer('hits').notNull(),
    windowStart: timestamp('window_start', { withTimezone: true }).notNull(),
  },
  (t) => [index('request_counters_window_idx').on(t.windowStart)],
);
