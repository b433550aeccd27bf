import { index, integer, pgTable, primaryKey, text, timestamp } from 'drizzle-orm/pg-core';

/**
 * The sign-in throttle's counters (server/auth/sign-in-throttle.ts), one row per client address
 * (`address:…`) and per address and account together (`pair:…`). In the database, not in memory, so
 * they survive a restart and two servers on one database count together.
 */
export const signInAttempts = pgTable(
  'sign_in_attempts',
  {
    key: text('key').primaryKey(),
    /** Attempts not (yet) known to have succeeded since the window started; counted before the password is checked. */
    failures: integer('failures').notNull().default(0),
    windowStart: timestamp('window_start', { withTimezone: true }).notNull(),
    /** No attempt under this key is checked before this time. */
    nextAt: timestamp('next_at', { withTimezone: true }).notNull(),
  },
  (t) => [index('sign_in_attempts_window_idx').on(t.windowStart)],
);

/**
 * Addresses each account has signed in from with its password: its usual addresses, from which the
 * right password is never refused for longer than a short delay.
 */
export const signInAddresses = pgTable(
  'sign_in_addresses',
  {
    email: text('email').notNull(),
    address: text('address').notNull(),
    lastAt: timestamp('last_at', { withTimezone: true }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.email, t.address] }), index('sign_in_addresses_last_idx').on(t.lastAt)],
);
