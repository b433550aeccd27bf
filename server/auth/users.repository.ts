import { count, eq, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { shops, users } from '../db/schema';
import type { LengthUnit } from '../../shared/units/length-unit';

/** An account as the server uses it: everything but the password hash. */
export const accountColumns = { id: users.id, email: users.email, name: users.name, role: users.role, units: users.units, demo: users.demo, active: users.active, shopId: users.shopId };

/** An account with whether its shop is active or suspended (joined to `shops`), for deciding who may sign in. */
export const accountWithShopColumns = { ...accountColumns, shopStatus: shops.status };

/** The account with this address (any case), with its password hash and its shop's status. */
export async function findAccountByEmail(db: Database, email: string) {
  const [row] = await db
    .select({ ...accountWithShopColumns, passwordHash: users.passwordHash })
    .from(users)
    .innerJoin(shops, eq(shops.id, users.shopId))
    .where(eq(sql`lower(${users.email})`, email.toLowerCase()));
  return row;
}

/** The account with this id and its shop's id and status, without its password hash. */
export async function findAccount(db: Database, id: number) {
  const [row] = await db.select(accountWithShopColumns).from(users).innerJoin(shops, eq(shops.id, users.shopId)).where(eq(users.id, id));
  return row;
}

/** How many accounts exist in the whole installation; the demo seed runs only when none do (outside any shop). */
export async function countUsers(db: Database): Promise<number> {
  const [row] = await db.select({ n: count() }).from(users);
  return row.n;
}

/** Adds accounts; returns them without their password hashes. */
export async function insertUsers(db: Database, rows: (typeof users.$inferInsert)[]) {
  return db.insert(users).values(rows).returning(accountColumns);
}

/** The active members' names and addresses, by name: the people mail can be sent to without typing an address (a deactivated member is no longer one of them). */
export function listPeople(db: Database) {
  return db.select({ name: users.name, email: users.email }).from(users).where(inOwnShop(users, eq(users.active, true))).orderBy(users.name);
}

/** Sets how an account reads lengths; the account with its new choice, or undefined when it is gone. */
export async function updateUnits(db: Database, id: number, units: LengthUnit) {
  const [row] = await db.update(users).set({ units }).where(inOwnShop(users, eq(users.id, id))).returning(accountColumns);
  return row;
}
