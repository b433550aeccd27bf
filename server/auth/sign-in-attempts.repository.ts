import { and, eq, gte, lt, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { signInAddresses, signInAttempts } from '../db/schema';

export type AttemptRow = typeof signInAttempts.$inferSelect;

/** The counter under `key`, created empty if there is none, locked until the transaction ends. */
export async function lockAttempts(tx: Database, key: string, now: Date): Promise<AttemptRow> {
  await tx.insert(signInAttempts).values({ key, failures: 0, windowStart: now, nextAt: now }).onConflictDoNothing();
  const [row] = await tx.select().from(signInAttempts).where(eq(signInAttempts.key, key)).for('update');
  return row;
}

export async function saveAttempts(tx: Database, row: AttemptRow): Promise<void> {
  await tx.update(signInAttempts).set({ failures: row.failures, windowStart: row.windowStart, nextAt: row.nextAt }).where(eq(signInAttempts.key, row.key));
}

export async function deleteAttempts(db: Database, key: string): Promise<void> {
  await db.delete(signInAttempts).where(eq(signInAttempts.key, key));
}

/** One attempt under `key` turned out to be the right password: it no longer counts. */
export async function uncountAttempt(db: Database, key: string): Promise<void> {
  await db
    .update(signInAttempts)
    .set({ failures: sql`greatest(${signInAttempts.failures} - 1, 0)` })
    .where(eq(signInAttempts.key, key));
}

/** Counters whose window started before `before`: nothing reads them any more. */
export async function pruneAttempts(db: Database, before: Date): Promise<void> {
  await db.delete(signInAttempts).where(lt(signInAttempts.windowStart, before));
}

/** Whether the account signed in from this address with its password since `since`. */
export async function isUsualAddress(db: Database, email: string, address: string, since: Date): Promise<boolean> {
  const [row] = await db
    .select({ email: signInAddresses.email })
    .from(signInAddresses)
    .where(and(eq(signInAddresses.email, email), eq(signInAddresses.address, address), gte(signInAddresses.lastAt, since)));
  return row !== undefined;
}

export async function rememberAddress(db: Database, email: string, address: string, at: Date): Promise<void> {
  await db
    .insert(signInAddresses)
    .values({ email, address, lastAt: at })
    .onConflictDoUpdate({ target: [signInAddresses.email, signInAddresses.address], set: { lastAt: at } });
}
