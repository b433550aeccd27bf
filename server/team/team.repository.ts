import { asc, desc, eq, isNull, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Database } from '../db/client';
import { inOwnShop, ownShop } from '../db/own-shop';
import { mailTokens, users } from '../db/schema';
import type { MailTokenPurpose } from '../db/schema/mail-tokens';

const memberColumns = { id: users.id, name: users.name, email: users.email, role: users.role, active: users.active, createdAt: users.createdAt };
export type MemberRow = { [K in keyof typeof memberColumns]: (typeof users.$inferSelect)[K] };

const sameAddress = (column: typeof users.email | typeof mailTokens.email, email: string) => eq(sql`lower(${column})`, email.toLowerCase());

/** Everyone who has an account, active or not, by name. */
export function listMembers(db: Database): Promise<MemberRow[]> {
  return db.select(memberColumns).from(users).where(ownShop(users)).orderBy(asc(users.name), asc(users.id));
}

/** One member; with `lock`, the row is held until the transaction ends (role and active changes). */
export async function findMember(db: Database, id: number, lock = false): Promise<MemberRow | undefined> {
  const query = db.select(memberColumns).from(users).where(inOwnShop(users, eq(users.id, id)));
  const [row] = await (lock ? query.for('update') : query);
  return row;
}

/** The member with this address (any case), if any. */
export async function findMemberByEmail(db: Database, email: string) {
  const [row] = await db
    .select({ ...memberColumns, demo: users.demo, shopId: users.shopId })
    .from(users)
    .where(sameAddress(users.email, email));
  return row;
}

/**
 * The active admins' ids, their rows held until the transaction ends. Every change of a member takes
 * these locks first, always in id order, then the member's own: two admins demoting each other at
 * once queue up instead of deadlocking, and the second sees what the first did.
 */
export async function lockActiveAdmins(db: Database): Promise<number[]> {
  const rows = await db
    .select({ id: users.id })
    .from(users)
    .where(inOwnShop(users, eq(users.role, 'admin'), eq(users.active, true)))
    .orderBy(asc(users.id))
    .for('update');
  return rows.map((r) => r.id);
}

export async function updateMember(db: Database, id: number, changes: Partial<Pick<typeof users.$inferInsert, 'role' | 'active' | 'passwordHash'>>): Promise<void> {
  await db.update(users).set(changes).where(inOwnShop(users, eq(users.id, id)));
}

export async function insertMember(db: Database, row: Pick<typeof users.$inferInsert, 'email' | 'name' | 'role' | 'passwordHash'>): Promise<MemberRow> {
  const [member] = await db.insert(users).values(row).returning(memberColumns);
  return member;
}

const inviter = alias(users, 'inviter');

/** Invitations not accepted yet (pending or expired), newest first, with who sent each. */
export function listOpenInvitations(db: Database) {
  return db
    .select({
      id: mailTokens.id,
      email: mailTokens.email,
      role: mailTokens.role,
      createdAt: mailTokens.createdAt,
      expiresAt: mailTokens.expiresAt,
      invitedBy: inviter.name,
    })
    .from(mailTokens)
    .leftJoin(inviter, eq(inviter.id, mailTokens.createdBy))
    .where(inOwnShop(mailTokens, eq(mailTokens.purpose, 'invite'), isNull(mailTokens.usedAt)))
    .orderBy(desc(mailTokens.createdAt), desc(mailTokens.id));
}

export async function insertMailToken(db: Database, row: Omit<typeof mailTokens.$inferInsert, 'id' | 'usedAt'>) {
  const [token] = await db.insert(mailTokens).values(row).returning();
  return token;
}

/** An invitation not accepted yet, by id. */
export async function findOpenInvitation(db: Database, id: number) {
  const [row] = await db
    .select()
    .from(mailTokens)
    .where(inOwnShop(mailTokens, eq(mailTokens.id, id), eq(mailTokens.purpose, 'invite'), isNull(mailTokens.usedAt)));
  return row;
}

export async function deleteMailToken(db: Database, id: number): Promise<void> {
  await db.delete(mailTokens).where(inOwnShop(mailTokens, eq(mailTokens.id, id)));
}

/** Withdraws the unused links of one purpose sent to an address: a new one replaces them. */
export async function deleteOpenTokensFor(db: Database, purpose: MailTokenPurpose, email: string): Promise<void> {
  await db.delete(mailTokens).where(inOwnShop(mailTokens, eq(mailTokens.purpose, purpose), isNull(mailTokens.usedAt), sameAddress(mailTokens.email, email)));
}

/** Withdraws a member's unused reset links (deactivated, or a reset just done). */
export async function deleteOpenResetsOf(db: Database, userId: number): Promise<void> {
  await db.delete(mailTokens).where(inOwnShop(mailTokens, eq(mailTokens.purpose, 'password-reset'), isNull(mailTokens.usedAt), eq(mailTokens.userId, userId)));
}

/** Ties an accepted invitation to the member it made. */
export async function linkInvitation(db: Database, tokenId: number, userId: number): Promise<void> {
  await db.update(mailTokens).set({ userId }).where(inOwnShop(mailTokens, eq(mailTokens.id, tokenId)));
}
