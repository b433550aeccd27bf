import { and, eq, gt, isNull, lt, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { signUps } from '../db/schema';

export type SignUpRow = typeof signUps.$inferSelect;

export async function insertSignUp(db: Database, row: Omit<typeof signUps.$inferInsert, 'id' | 'usedAt' | 'createdShopId'>): Promise<void> {
  await db.insert(signUps).values(row);
}

export async function findSignUp(db: Database, tokenHash: string): Promise<SignUpRow | undefined> {
  const [row] = await db.select().from(signUps).where(eq(signUps.tokenHash, tokenHash));
  return row;
}

/** Marks the sign-up used in one statement that only a live one passes, so two uses racing cannot both get through. */
export async function useSignUp(tx: Database, tokenHash: string, now: Date): Promise<SignUpRow | undefined> {
  const [row] = await tx
    .update(signUps)
    .set({ usedAt: now })
    .where(and(eq(signUps.tokenHash, tokenHash), isNull(signUps.usedAt), gt(signUps.expiresAt, now)))
    .returning();
  return row;
}

export async function setCreatedShop(tx: Database, id: number, shopId: number): Promise<void> {
  await tx.update(signUps).set({ createdShopId: shopId }).where(eq(signUps.id, id));
}

/** An address's earlier links that were never followed: a newer request replaces them. */
export async function deleteOpenSignUpsOf(db: Database, email: string): Promise<void> {
  await db.delete(signUps).where(and(eq(sql`lower(${signUps.email})`, email.toLowerCase()), isNull(signUps.usedAt)));
}

/** Sign-ups whose link expired before `before`, followed or not: nothing reads them any more. */
export async function pruneSignUps(db: Database, before: Date): Promise<void> {
  await db.delete(signUps).where(lt(signUps.expiresAt, before));
}
