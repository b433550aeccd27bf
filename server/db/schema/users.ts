import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './shops';
import { role, type Role } from '../../../shared/api/contract';
import { LENGTH_UNITS, type LengthUnit } from '../../../shared/units/length-unit';
import { oneOf } from './check';

export const users = pgTable(
  'users',
  {
    id: integer('id').primaryKey().generatedByDefaultAsIdentity(),
    shopId: shopIdColumn(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: text('role').$type<Role>().notNull(),
    passwordHash: text('password_hash').notNull(),
    /** Demo accounts are refused in production unless the operator allows them. */
    demo: boolean('demo').notNull().default(false),
    /** A deactivated member cannot sign in and their sessions are ended; their name stays in the history. */
    active: boolean('active').notNull().default(true),
    /** How this member reads and types lengths on screen and in packs made for them; the data stays in mm. */
    units: text('units').$type<LengthUnit>().notNull().default('mm'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    // Sign-in lowercases the address; the index makes "A@x" and "a@x" one account.
    index('users_shop_idx').on(t.shopId),
    // One account, one shop: an address is unique across shops, so sign-in finds its shop by it.
    uniqueIndex('users_email_unique').on(sql`lower(${t.email})`),
    check('users_role_check', oneOf(t.role, role.options)),
    check('users_units_check', oneOf(t.units, LENGTH_UNITS)),
  ],
);
