import { eq } from 'drizzle-orm';
import type { PlannedCarcass } from '../../shared/api/plan-contract';
import type { User } from '../../shared/api/contract';
import type { Panel } from '../../shared/model/job-document';
import { planCarcass, type CarcassPlan } from '../../shared/planner/plan-carcass';
import { changedSincePlanned, replacement, type ChangedPanelChoice, type StoredPanel } from '../../shared/planner/replan';
import { recordActivity } from '../activity/activity.repository';
import { shopCatalog } from '../catalog/shop-catalog';
import type { Database } from '../db/client';
import { inOwnShop } from '../db/own-shop';
import { boreDraft, carcassDraft, panelDraft, placementDraft, toCarcass, type CarcassRow } from '../db/job-mapping';
import { panels as panelTable } from '../db/schema';
import { AppError } from '../http/app-error';
import { carcassKeys, insertCarcass, touchJob, updateCarcass } from '../jobs/jobs.repository';
import { writableJob } from '../jobs/writable-job';
import { liveMember, recordJobEvent } from '../live/job-events.repository';
import * as panels from '../panels/panels.repository';

/**
 * Plans a carcass with the job's own materials, system and limits and stores it with all its panels,
 * their drilling and their hang relations in one transaction: either all of it or nothing. A new id
 * adds the carcass; the id of a carcass already in the job plans that one again (see `replan`).
 * A description the planner refuses answers 400 with every problem led by its path, in the actor's units.
 */
export async function storePlannedCarcass(db: Database, actor: User, jobId: number, body: unknown, choice?: ChangedPanelChoice): Promise<PlannedCarcass> {
  return db.transaction(async (tx) => {
    const job = await writableJob(tx, jobId);
    const description = typeof body === 'object' && body !== null ? body : {};
    const result = planCarcass({ ...description, materials: job.materials, system: job.system, limits: job.limits }, await shopCatalog(tx), { unit: actor.units });
    if (!result.ok) throw new AppError(400, 'invalid-input', `The carcass cannot be planned: ${result.errors[0]}`, { details: result.errors });
    const { plan } = result;
    const existing = (await carcassKeys(tx, jobId)).get(plan.carcass.id);
    const stored = existing === undefined ? await addCarcass(tx, actor, jobId, plan) : await replan(tx, actor, jobId, existing, plan, choice);
    await touchJob(tx, jobId);
    await recordJobEvent(tx, jobId, 'job-planned', { carcass: stored.carcass.id, panelIds: stored.panels.map((p) => p.dbId), by: liveMember(actor) });
    return stored;
  });
}

async function addCarcass(tx: Database, actor: User, jobId: number, plan: CarcassPlan): Promise<PlannedCarcass> {
  const taken = new Set((await panels.jobPanelRefs(tx, jobId)).map((p) => p.key));
  const clash = plan.panels.find((p) => taken.has(p.id));
  if (clash) throw new AppError(409, 'duplicate-id', `id: this job already has a panel "${clash.id}"; give the carcass another id.`, { fields: { id: 'is already used in this job' } });
  const row = await insertCarcass(tx, jobId, carcassDraft(plan.carcass));
  const key = row.key;
  for (const p of plan.panels) await insertPlannedPanel(tx, jobId, row.id, p);
  await recordActivity(tx, { userId: actor.id, jobId, action: 'carcass.planned', details: { carcass: key, name: row.name, panels: plan.panels.length } });
  return { carcass: toCarcass(row), panels: await carcassPanelRecords(tx, row.id), kept: [] };
}

/**
 * Plans a carcass of the job again. Panels changed by hand since they were planned are never lost
 * silently: without a choice the request is refused (409 `replan-changed`) naming them, and the
 * designer chooses to keep them as they are or to replace them. Panels written over keep their
 * database id, so their history and links stay.
 */
async function replan(tx: Database, actor: User, jobId: number, carcassId: number, plan: CarcassPlan, choice: ChangedPanelChoice | undefined): Promise<PlannedCarcass> {
  const current = await carcassPanelRecords(tx, carcassId);
  const stored: StoredPanel[] = current.map((record) => ({ panel: record, version: record.version, status: record.status }));
  const changed = changedSincePlanned(stored, plan.panels);
  if (changed.length > 0 && choice === undefined) {
    throw new AppError(
      409,
      'replan-changed',
      `${changed.length} panel${changed.length === 1 ? ' of this carcass was' : 's of this carcass were'} changed since planned: keep ${changed.length === 1 ? 'it' : 'them'} as ${changed.length === 1 ? 'it is' : 'they are'}, or replace ${changed.length === 1 ? 'it' : 'them'} with the new plan.`,
      { details: changed.map((c) => `${c.name} (${c.id}), ${c.status}${c.dropped ? ', not in the new plan' : ''}`) },
    );
  }
  const others = (await panels.jobPanelRefs(tx, jobId)).map((p) => p.key).filter((key) => !current.some((c) => c.id === key));
  const clash = plan.panels.find((p) => others.includes(p.id));
  if (clash) throw new AppError(409, 'duplicate-id', `id: another carcass of this job has a panel "${clash.id}"; give the carcass another id.`, { fields: { id: 'is already used in this job' } });

  const { update, insert, remove, keep } = replacement(stored, plan.panels, choice ?? 'replace');
  const byKey = new Map(current.map((c) => [c.id, c]));
  for (const p of update) {
    const record = byKey.get(p.id)!;
    // The status stays: a drilled panel written over with the same drilling is still drilled.
    const { status: _status, ...fields } = panelDraft(p);
    if (!(await panels.updatePanelAtVersion(tx, record.dbId, record.version, fields))) throw stale(p.id);
    await panels.replaceDrilling(tx, record.dbId, p.placements.map(placementDraft), p.bores.map(boreDraft));
  }
  for (const key of remove) {
    const record = byKey.get(key)!;
    if (!(await panels.deletePanelAtVersion(tx, record.dbId, record.version))) throw stale(key);
  }
  for (const p of insert) await insertPlannedPanel(tx, jobId, carcassId, p);
  const { key, ...fields } = carcassDraft(plan.carcass);
  const row: CarcassRow = await updateCarcass(tx, carcassId, fields);
  await recordActivity(tx, {
    userId: actor.id,
    jobId,
    action: 'carcass.replanned',
    details: { carcass: key, name: row.name, updated: update.length, added: insert.length, removed: remove.length, kept: keep },
  });
  return { carcass: toCarcass(row), panels: await carcassPanelRecords(tx, carcassId), kept: keep };
}

function stale(panelKey: string): AppError {
  return new AppError(409, 'stale-version', `Panel "${panelKey}" changed while the carcass was being planned again; reload and try again.`);
}

async function insertPlannedPanel(tx: Database, jobId: number, carcassId: number, p: Panel): Promise<void> {
  const panelId = await panels.insertPanel(tx, { ...panelDraft(p), jobId, carcassId });
  await panels.insertDrilling(tx, panelId, p.placements.map(placementDraft), p.bores.map(boreDraft));
}

async function carcassPanelRecords(tx: Database, carcassId: number) {
  const rows = await tx.select({ id: panelTable.id }).from(panelTable).where(inOwnShop(panelTable, eq(panelTable.carcassId, carcassId))).orderBy(panelTable.id);
  const records = [];
  for (const { id } of rows) {
    const record = await panels.loadPanelRecord(tx, id);
    if (record) records.push(record);
  }
  return records;
}
