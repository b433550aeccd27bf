import { desc, eq } from 'drizzle-orm';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { activity, users } from '../db/schema';

export type ActivityDraft = Omit<typeof activity.$inferInsert, 'id' | 'at'>;

/** Writes one entry; pass the transaction of the change it describes, so both land or neither. */
export async function recordActivity(tx: Database, entry: ActivityDraft): Promise<void> {
  await tx.insert(activity).values(entry);
}

/** The latest entries, newest first, with the name of who made each. */
export function listActivity(db: Database, filter: { jobId?: number; limit: number }) {
  return db
    .select({
      id: activity.id,
      at: activity.at,
      action: activity.action,
      jobId: activity.jobId,
      panelId: activity.panelId,
      details: activity.details,
      userId: users.id,
      userName: users.name,
    })
    .from(activity)
    .leftJoin(users, eq(users.id, activity.userId))
    .where(inOwnShop(activity, filter.jobId === undefined ? undefined : eq(activity.jobId, filter.jobId)))
    .orderBy(desc(activity.at), desc(activity.id))
    .limit(filter.limit);
}
