import { eq } from 'drizzle-orm';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { placements } from '../db/schema';

/** Gives every placement of fitting `from` on a panel fitting `to`; returns how many it changed. */
export async function swapPanelPlacements(db: Database, panelId: number, from: string, to: string): Promise<number> {
  const rows = await db
    .update(placements)
    .set({ fitting: to })
    .where(inOwnShop(placements, eq(placements.panelId, panelId), eq(placements.fitting, from)))
    .returning({ id: placements.id });
  return rows.length;
}
