import { eq } from 'drizzle-orm';
import type { MachineSettings } from '../../shared/export/machine-settings';
import type { Database } from '../db/client';
import { ownShop } from '../db/own-shop';
import { shopSettings, users } from '../db/schema';

/** The shop's settings row (the scope's shop has one at most), with the name of who saved it; none until an admin saves them. */
export async function findShopSettings(db: Database) {
  const [row] = await db
    .select({ machine: shopSettings.machine, updatedAt: shopSettings.updatedAt, updatedBy: users.name })
    .from(shopSettings)
    .leftJoin(users, eq(users.id, shopSettings.updatedBy))
    .where(ownShop(shopSettings));
  return row;
}

/** Writes the machine settings into the shop's row, making it the first time. */
export async function saveMachineSettings(db: Database, machine: MachineSettings, updatedBy: number, updatedAt: Date) {
  await db
    .insert(shopSettings)
    .values({ machine, updatedBy, updatedAt })
    .onConflictDoUpdate({ target: shopSettings.shopId, set: { machine, updatedBy, updatedAt } });
}
