import { asc, countDistinct, eq, inArray } from 'drizzle-orm';
import type { Fitting } from '../../shared/catalog/fitting';
import type { Database } from '../db/client';
import { inOwnShop, ownShop } from '../db/own-shop';
import { jobs, panels, placements, shopFittings, users } from '../db/schema';

/** The shop's fittings as stored, in the order they were imported, with the name of who imported each. */
export function listShopFittings(db: Database) {
  return db
    .select({ fittingId: shopFittings.fittingId, fitting: shopFittings.fitting, createdAt: shopFittings.createdAt, createdBy: users.name })
    .from(shopFittings)
    .leftJoin(users, eq(users.id, shopFittings.createdBy))
    .where(ownShop(shopFittings))
    .orderBy(asc(shopFittings.id));
}

/** The stored shop fittings among these ids. */
export function findShopFittings(db: Database, fittingIds: readonly string[]) {
  if (fittingIds.length === 0) return Promise.resolve([]);
  return db
    .select({ fittingId: shopFittings.fittingId, fitting: shopFittings.fitting, createdAt: shopFittings.createdAt })
    .from(shopFittings)
    .where(inOwnShop(shopFittings, inArray(shopFittings.fittingId, [...fittingIds])));
}

/** Stores fittings already validated; call inside the import's transaction. */
export async function insertShopFittings(tx: Database, fittings: readonly Fitting[], createdBy: number) {
  return tx
    .insert(shopFittings)
    .values(fittings.map((fitting) => ({ fittingId: fitting.id, fitting, createdBy })))
    .returning({ fittingId: shopFittings.fittingId, createdAt: shopFittings.createdAt });
}

/** Removes one shop fitting; false when there was none by that id. */
export async function deleteShopFitting(tx: Database, fittingId: string): Promise<boolean> {
  const gone = await tx.delete(shopFittings).where(inOwnShop(shopFittings, eq(shopFittings.fittingId, fittingId))).returning({ id: shopFittings.id });
  return gone.length > 0;
}

/** The jobs (archived ones too) with a placement of this fitting, with how many placements on how many panels. */
export function jobsUsingFitting(db: Database, fittingId: string) {
  return db
    .select({
      id: jobs.id,
      name: jobs.name,
      archived: jobs.archived,
      placements: countDistinct(placements.id),
      panels: countDistinct(panels.id),
    })
    .from(placements)
    .innerJoin(panels, eq(panels.id, placements.panelId))
    .innerJoin(jobs, eq(jobs.id, panels.jobId))
    .where(inOwnShop(placements, eq(placements.fitting, fittingId)))
    .groupBy(jobs.id, jobs.name, jobs.archived)
    .orderBy(asc(jobs.name), asc(jobs.id));
}
