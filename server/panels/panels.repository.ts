import { asc, eq, sql, type SQL } from 'drizzle-orm';
import type { PanelRecord } from '../../shared/api/contract';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { toPanelRecord, type BoreDraft, type PanelDraft, type PanelRow, type PlacementDraft } from '../db/job-mapping';
import { bores, carcasses, panels, placements, users } from '../db/schema';

/** The panel's row, without its drilling. */
export async function findPanel(db: Database, id: number): Promise<PanelRow | undefined> {
  const [row] = await db.select().from(panels).where(inOwnShop(panels, eq(panels.id, id)));
  return row;
}

/** The panels of a job: their document ids and hang relations, for id choice and reference checks. */
export function jobPanelRefs(db: Database, jobId: number) {
  return db.select({ key: panels.key, name: panels.name, hang: panels.hang }).from(panels).where(inOwnShop(panels, eq(panels.jobId, jobId)));
}

/** The panel as the API returns it; undefined when there is no such panel. */
export async function loadPanelRecord(db: Database, id: number): Promise<PanelRecord | undefined> {
  const [found] = await db
    .select({ panel: panels, carcassKey: carcasses.key, statusBy: users.name })
    .from(panels)
    .leftJoin(carcasses, eq(carcasses.id, panels.carcassId))
    .leftJoin(users, eq(users.id, panels.statusBy))
    .where(inOwnShop(panels, eq(panels.id, id)));
  if (!found) return undefined;
  const [placementRows, boreRows] = await Promise.all([
    db.select().from(placements).where(inOwnShop(placements, eq(placements.panelId, id))).orderBy(asc(placements.id)),
    db.select().from(bores).where(inOwnShop(bores, eq(bores.panelId, id))).orderBy(asc(bores.id)),
  ]);
  return toPanelRecord(found.panel, found.carcassKey ?? undefined, placementRows, boreRows, found.statusBy);
}

/** Adds a panel row; returns its database id. */
export async function insertPanel(db: Database, row: PanelDraft & { jobId: number; carcassId: number | null }): Promise<number> {
  const [{ id }] = await db.insert(panels).values(row).returning({ id: panels.id });
  return id;
}

/** What a change may set on a panel's row; `statusAt` takes SQL so that it can be the database's now(). */
export type PanelChanges = Partial<PanelDraft & { carcassId: number | null; statusBy: number | null; statusAt: Date | SQL | null }>;

/**
 * Applies the changes and bumps the version, but only while the panel is still at `version`.
 * Returns the new row, or undefined when someone else got there first.
 */
export async function updatePanelAtVersion(db: Database, id: number, version: number, changes: PanelChanges): Promise<PanelRow | undefined> {
  const [row] = await db
    .update(panels)
    .set({ ...changes, version: sql`${panels.version} + 1`, updatedAt: sql`now()` })
    .where(inOwnShop(panels, eq(panels.id, id), eq(panels.version, version)))
    .returning();
  return row;
}

/** Deletes the panel (its placements and bores go with it) if it is still at `version`. */
export async function deletePanelAtVersion(db: Database, id: number, version: number): Promise<boolean> {
  const rows = await db
    .delete(panels)
    .where(inOwnShop(panels, eq(panels.id, id), eq(panels.version, version)))
    .returning({ id: panels.id });
  return rows.length > 0;
}

/** Rows per INSERT: PostgreSQL takes at most 65,535 parameters per statement, and a bore row uses 11. */
const CHUNK = 1000;

async function insertChunked<T>(rows: readonly T[], insert: (chunk: T[]) => Promise<unknown>): Promise<void> {
  for (let i = 0; i < rows.length; i += CHUNK) await insert(rows.slice(i, i + CHUNK));
}

/** Stores a panel's placements and bores, in their order. */
export async function insertDrilling(db: Database, panelId: number, placementRows: PlacementDraft[], boreRows: BoreDraft[]): Promise<void> {
  await insertChunked(placementRows, (chunk) => db.insert(placements).values(chunk.map((row) => ({ ...row, panelId }))));
  await insertChunked(boreRows, (chunk) => db.insert(bores).values(chunk.map((row) => ({ ...row, panelId }))));
}

/** Replaces the panel's placements and bores by these lists. */
export async function replaceDrilling(db: Database, panelId: number, placementRows: PlacementDraft[], boreRows: BoreDraft[]): Promise<void> {
  await db.delete(placements).where(inOwnShop(placements, eq(placements.panelId, panelId)));
  await db.delete(bores).where(inOwnShop(bores, eq(bores.panelId, panelId)));
  await insertDrilling(db, panelId, placementRows, boreRows);
}
