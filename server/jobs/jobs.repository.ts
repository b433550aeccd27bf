import { setImmediate } from 'node:timers/promises';
import { and, asc, count, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { inOwnShop, ownShopParams, ownShopPlaceholder } from '../db/own-shop';
import { preparedPerDatabase } from '../db/prepared';
import { selectAsJson } from '../db/rows-as-json';
import type { CarcassDraft, JobDocumentDraft, JobRows } from '../db/job-mapping';
import { bores, carcasses, jobs, panels, placements, users } from '../db/schema';
import { insertDrilling, insertPanel } from '../panels/panels.repository';

const summaryColumns = (db: Database) => ({
  id: jobs.id,
  name: jobs.name,
  client: jobs.client,
  notes: jobs.notes,
  archived: jobs.archived,
  version: jobs.version,
  carcassCount: db.$count(carcasses, inOwnShop(carcasses, eq(carcasses.jobId, jobs.id))),
  panelCount: db.$count(panels, inOwnShop(panels, eq(panels.jobId, jobs.id))),
  updatedAt: jobs.updatedAt,
});

/** Jobs, the most recently changed first. */
export function listJobSummaries(db: Database, archived: boolean) {
  return db.select(summaryColumns(db)).from(jobs).where(inOwnShop(jobs, eq(jobs.archived, archived))).orderBy(desc(jobs.updatedAt), desc(jobs.id));
}

/** One job with its counts, as listed. */
export async function findJobSummary(db: Database, id: number) {
  const [row] = await db.select(summaryColumns(db)).from(jobs).where(inOwnShop(jobs, eq(jobs.id, id)));
  return row;
}

/** How many jobs exist in the whole installation, archived ones included: the demo seed's check, outside any shop. */
export async function countJobs(db: Database): Promise<number> {
  const [row] = await db.select({ n: count() }).from(jobs);
  return row.n;
}

/** The job's own row: settings, limits and materials included. */
export async function findJob(db: Database, id: number) {
  const [row] = await db.select().from(jobs).where(inOwnShop(jobs, eq(jobs.id, id)));
  return row;
}

/** The job's own row, locked until the transaction ends, so that archiving it waits for a write under way. */
export async function lockJob(tx: Database, id: number) {
  const [row] = await tx.select().from(jobs).where(inOwnShop(jobs, eq(jobs.id, id))).for('update');
  return row;
}

/** The query of every job read. */
const jobStampRead = preparedPerDatabase((db) =>
  db
    .select({ version: jobs.version, writtenBy: sql<string>`${jobs}.xmin::text`, updatedAt: sql<string>`(extract(epoch from ${jobs.updatedAt}) * 1000000)::bigint::text` })
    .from(jobs)
    .where(and(eq(jobs.id, sql.placeholder('id')), ownShopPlaceholder(jobs)))
    .prepare('job_stamp'),
);

/**
 * What identifies the job's stored state: its version and the transaction that last wrote its row. Every
 * change to the job or anything in it writes the row (`touchJob` in the same transaction), so any change
 * gives a new stamp, and a database restored or rebuilt gives a new `updatedAt` too.
 */
export async function findJobStamp(db: Database, id: number): Promise<{ version: number; writtenBy: string; updatedAt: string } | undefined> {
  const [row] = await jobStampRead(db).execute(ownShopParams({ id }));
  return row;
}

/**
 * Panels whose placements and bores one query reads. PGlite runs a query on the server's own thread and
 * answers without giving the event loop a turn, so a 300-panel job read in one query held every other
 * request for hundreds of ms; read in slices, with the event loop let go between them, no request waits
 * for more than one slice.
 */
export const PANELS_A_SLICE = 16;
/** A job of up to this many panels (a kitchen, a wall unit) is read in one piece, as before, with no second look at its row. */
const PANELS_IN_ONE_PIECE = 48;
/** Sliced reads of a job that a change overtook, before it is read in one piece. */
const SLICED_TRIES = 3;

/**
 * Everything stored for one job, children in stored order; undefined when there is no such job. A
 * panel's `statusBy` member comes with its row. Placements and bores, thousands of rows in a large job,
 * come as JSON (rows-as-json.ts), a slice of panels at a time; as other requests may write between the
 * slices, and every change to a job writes its row (`touchJob`), a sliced read whose job row was written
 * meanwhile (its `xmin`, as in the job's stamp) is read again, so that what is returned is the job as it
 * stood at one moment.
 */
export async function loadJobRows(db: Database, id: number): Promise<JobRows | undefined> {
  for (let attempt = 1; ; attempt++) {
    const read = await readJobRows(db, id, attempt <= SLICED_TRIES);
    if (!read || !read.sliced || read.writtenBy === (await findJobStamp(db, id))?.writtenBy) return read?.rows;
  }
}

async function readJobRows(db: Database, id: number, maySlice: boolean): Promise<{ rows: JobRows; writtenBy: string; sliced: boolean } | undefined> {
  const [found] = await db
    .select({ job: jobs, writtenBy: sql<string>`${jobs}.xmin::text` })
    .from(jobs)
    .where(inOwnShop(jobs, eq(jobs.id, id)));
  if (!found) return undefined;
  const [carcassRows, panelRows] = await Promise.all([
    db.select().from(carcasses).where(inOwnShop(carcasses, eq(carcasses.jobId, id))).orderBy(asc(carcasses.id)),
    db.select({ panel: panels, statusByName: users.name }).from(panels).leftJoin(users, eq(users.id, panels.statusBy)).where(inOwnShop(panels, eq(panels.jobId, id))).orderBy(asc(panels.id)),
  ]);
  const sliced = maySlice && panelRows.length > PANELS_IN_ONE_PIECE;
  const panelsASlice = sliced ? PANELS_A_SLICE : panelRows.length;
  const placementRows: JobRows['placements'] = [];
  const boreRows: JobRows['bores'] = [];
  for (let first = 0; first < panelRows.length; first += panelsASlice) {
    const ids = panelRows.slice(first, first + panelsASlice).map((r) => r.panel.id);
    const [placementSlice, boreSlice] = await Promise.all([
      selectAsJson(db, placements, inOwnShop(placements, inArray(placements.panelId, ids)), placements.id),
      selectAsJson(db, bores, inOwnShop(bores, inArray(bores.panelId, ids)), bores.id),
    ]);
    placementRows.push(...placementSlice);
    boreRows.push(...boreSlice);
    if (sliced) await setImmediate();
  }
  const people = new Map<number, string>();
  for (const { panel, statusByName } of panelRows) if (panel.statusBy !== null && statusByName !== null) people.set(panel.statusBy, statusByName);
  return { rows: { job: found.job, carcasses: carcassRows, panels: panelRows.map((r) => r.panel), placements: placementRows, bores: boreRows, people }, writtenBy: found.writtenBy, sliced };
}

/** Stores a whole job; call inside a transaction so a failure leaves nothing behind. Returns the job's id. */
export async function insertJobDraft(tx: Database, draft: JobDocumentDraft): Promise<number> {
  const [{ id: jobId }] = await tx.insert(jobs).values(draft.job).returning({ id: jobs.id });
  const carcassIds = new Map<string, number>();
  if (draft.carcasses.length > 0) {
    const rows = await tx
      .insert(carcasses)
      .values(draft.carcasses.map((c) => ({ ...c, jobId })))
      .returning({ id: carcasses.id, key: carcasses.key });
    for (const row of rows) carcassIds.set(row.key, row.id);
  }
  for (const p of draft.panels) {
    const carcassId = p.carcassKey === null ? null : (carcassIds.get(p.carcassKey) ?? null);
    const panelId = await insertPanel(tx, { ...p.panel, jobId, carcassId });
    await insertDrilling(tx, panelId, p.placements, p.bores);
  }
  return jobId;
}

/**
 * Changes the job's own fields and bumps its version, but only while the job is still at `version`;
 * undefined when it is not (or there is no such job).
 */
export async function updateJobAtVersion(
  db: Database,
  id: number,
  version: number,
  changes: Partial<Pick<typeof jobs.$inferInsert, 'name' | 'client' | 'notes' | 'archived'>>,
) {
  const [row] = await db
    .update(jobs)
    .set({ ...changes, version: sql`${jobs.version} + 1`, updatedAt: sql`now()` })
    .where(inOwnShop(jobs, eq(jobs.id, id), eq(jobs.version, version)))
    .returning({ id: jobs.id });
  return row;
}

/** Marks the job changed, for the jobs list's order. */
export async function touchJob(db: Database, id: number): Promise<void> {
  await db.update(jobs).set({ updatedAt: sql`now()` }).where(inOwnShop(jobs, eq(jobs.id, id)));
}

/** The job's carcasses: document id to database id. */
export async function carcassKeys(db: Database, jobId: number): Promise<Map<string, number>> {
  const rows = await db.select({ id: carcasses.id, key: carcasses.key }).from(carcasses).where(inOwnShop(carcasses, eq(carcasses.jobId, jobId)));
  return new Map(rows.map((r) => [r.key, r.id]));
}

/** Changes a carcass's fields and returns its row. */
export async function updateCarcass(db: Database, id: number, changes: Omit<CarcassDraft, 'key'>) {
  const [row] = await db.update(carcasses).set(changes).where(inOwnShop(carcasses, eq(carcasses.id, id))).returning();
  return row;
}

/** Adds a carcass to the job and returns its row. */
export async function insertCarcass(db: Database, jobId: number, draft: CarcassDraft) {
  const [row] = await db.insert(carcasses).values({ ...draft, jobId }).returning();
  return row;
}
