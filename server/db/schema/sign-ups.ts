import { sql } from 'drizzle-orm';
import { index, integer, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { shops } from './shops';

/**
 * A shop asked for and not yet confirmed (server/signup/): what the visitor typed, waiting for the
 * mailed link. It belongs to no shop, as the shop is made only when the link is followed (created_shop_id then
 * says which). As with mail_tokens, only the token's SHA-256 is kept; used_at marks the one use.
 */
export const signUps = pgTable(
  'sign_ups',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    tokenHash: text('token_hash').notNull(),
    email: text('email').notNull(),
    shopName: text('shop_name').notNull(),
    name: text('name').notNull(),
    passwordHash: text('password_hash').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdShopId: integer('created_shop_id').references(() => shops.id, { onDelete: 'set null' }),
  },
  (t) => [uniqueIndex('sign_ups_hash_unique').on(t.tokenHash), index('sign_ups_email_idx').on(sql`lower(${t.email})`), index('sign_ups_expires_idx').on(t.expiresAt)],
);
