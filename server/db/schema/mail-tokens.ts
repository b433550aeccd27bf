import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { role, type Role } from '../../../shared/api/contract';
import { oneOf } from './check';
import { users } from './users';

export const mailTokenPurposes = ['invite', 'password-reset'] as const;
export type MailTokenPurpose = (typeof mailTokenPurposes)[number];

/**
 * The single-use links sent by mail: an invitation to join the shop (with the role it grants) or a
 * password reset (for an existing member). Only the token's SHA-256 is stored, so a copy of the
 * database cannot be used to sign in; used_at marks the one use.
 */
export const mailTokens = pgTable(
  'mail_tokens',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    purpose: text('purpose').$type<MailTokenPurpose>().notNull(),
    tokenHash: text('token_hash').notNull(),
    email: text('email').notNull(),
    /** The role an invitation grants; null for a reset. */
    role: text('role').$type<Role>(),
    /** The member a reset is for; null for an invitation until it is accepted. */
    userId: integer('user_id').references(() => users.id, { onDelete: 'cascade' }),
    createdBy: integer('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
  },
  (t) => [
    index('mail_tokens_shop_idx').on(t.shopId),
    uniqueIndex('mail_tokens_hash_unique').on(t.tokenHash),
    index('mail_tokens_email_idx').on(sql`lower(${t.email})`),
    check('mail_tokens_purpose_check', oneOf(t.purpose, mailTokenPurposes)),
    check('mail_tokens_role_check', sql`${t.role} is null or ${oneOf(t.role, role.options)}`),
  ],
);
