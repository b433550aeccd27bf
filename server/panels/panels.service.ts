import { sql } from 'drizzle-orm';
import type { z } from 'zod';
import type { PanelRecord, User, panelDrillingBody, panelFieldsBody, panelStatusBody, panelUpdateBody } from '../../shared/api/contract';
import { recordActivity } from '../activity/activity.repository';
import type { Database } from '../db/client';
import type { PanelStatus } from '../../shared/model/job-document';
import { statusStep } from '../../shared/model/panel-status';
import { boreDraft, placementDraft, type PanelRow } from '../db/job-mapping';
import { AppError, invalidField, notFound, staleVersion } from '../http/app-error';
import { nextDocumentId } from '../jobs/document-ids';
import { carcassKeys, touchJob } from '../jobs/jobs.repository';
import { writableJob } from '../jobs/writable-job';
import { liveMember, recordJobEvent } from '../live/job-events.repository';
import * as repo from './panels.repository';

type BoardFields = Partial<z.output<typeof panelFieldsBody>>;
type JobRow = Awaited<ReturnType<typeof writableJob>>;

const stale = (current?: number) => staleVersion('this panel', current);

/** Checks board fields against the job (its materials and carcasses) and turns them into column changes. */
async function boardChanges(tx: Database, job: JobRow, fields: BoardFields): Promise<repo.PanelChanges> {
  const { carcass, ...columns } = fields;
  if (columns.material !== undefined && !job.materials.some((m) => m.id === columns.material)) {
    throw invalidField('material', `this job has no material with id "${columns.material}"`);
  }
  if (carcass === undefined) return columns;
  if (carcass === null) return { ...columns, carcassId: null };
  const carcassId = (await carcassKeys(tx, job.id)).get(carcass);
  if (carcassId === undefined) throw invalidField('carcass', `this job has no carcass with id "${carcass}"`);
  return { ...columns, carcassId };
}

async function recordOf(tx: Database, panelId: number): Promise<PanelRecord> {
  const record = await repo.loadPanelRecord(tx, panelId);
  if (!record) throw notFound(`Panel ${panelId}`);
  return record;
}

/** Adds a panel with a fresh id made from its role (`door-3`). */
export async function addPanel(db: Database, actor: User, jobId: number, body: z.output<typeof panelFieldsBody>): Promise<PanelRecord> {
  return db.transaction(async (tx) => {
    const changes = await boardChanges(tx, await writableJob(tx, jobId), body);
    const taken = new Set((await repo.jobPanelRefs(tx, jobId)).map((p) => p.key));
    const key = nextDocumentId(body.role, taken);
    const panelId = await repo.insertPanel(tx, {
      key,
      name: body.name,
      role: body.role,
      width: body.width,
      height: body.height,
      thickness: body.thickness,
      material: body.material,
      status: 'planned',
      hang: null,
      handleMass: null,
      jobId,
      carcassId: changes.carcassId ?? null,
    });
    await touchJob(tx, jobId);
    await recordActivity(tx, { userId: actor.id, jobId, panelId, action: 'panel.created', details: { panel: key, name: body.name } });
    const record = await recordOf(tx, panelId);
    await recordJobEvent(tx, jobId, 'panel-added', { panelId, version: record.version, by: liveMember(actor) });
    return record;
  });
}

/**
 * Every change to one panel tells the same story: the panel exists, the client saw its current
 * version, the change applies and bumps the version, the job is touched and the change logged,
 * all in one transaction.
 */
async function changePanel(
  db: Database,
  actor: User,
  panelId: number,
  version: number,
  action: string,
  event: 'panel-saved' | 'panel-marked',
  apply: (tx: Database, current: PanelRow, job: JobRow) => Promise<{ changes?: repo.PanelChanges; details: Record<string, unknown> }>,
): Promise<PanelRecord> {
  return db.transaction(async (tx) => {
    const current = await repo.findPanel(tx, panelId);
    if (!current) throw notFound(`Panel ${panelId}`);
    const job = await writableJob(tx, current.jobId);
    if (current.version !== version) throw stale(current.version);
    const { changes = {}, details } = await apply(tx, current, job);
    if (!(await repo.updatePanelAtVersion(tx, panelId, version, changes))) throw stale();
    await touchJob(tx, current.jobId);
    await recordActivity(tx, { userId: actor.id, jobId: current.jobId, panelId, action, details: { panel: current.key, ...details } });
    const record = await recordOf(tx, panelId);
    const by = liveMember(actor);
    await recordJobEvent(tx, current.jobId, event, { panelId, version: record.version, status: record.status, by });
    return record;
  });
}

/** Changes a panel's board fields (name, role, sizes, material, carcass) at the version the client saw. */
export function updatePanel(db: Database, actor: User, panelId: number, body: z.output<typeof panelUpdateBody>): Promise<PanelRecord> {
  const { version, ...fields } = body;
  const named = Object.keys(fields).filter((k) => fields[k as keyof typeof fields] !== undefined);
  if (named.length === 0) {
    throw new AppError(400, 'invalid-input', 'Nothing to change: send at least one field besides version.', {
      fields: { '(body)': 'names no field to change' },
    });
  }
  return changePanel(db, actor, panelId, version, 'panel.updated', 'panel-saved', async (tx, _current, job) => ({
    changes: await boardChanges(tx, job, fields),
    details: { fields: named },
  }));
}

/** Replaces the panel's placements and bores (the editor saves the whole panel at once). */
export function saveDrilling(db: Database, actor: User, panelId: number, body: z.output<typeof panelDrillingBody>): Promise<PanelRecord> {
  return changePanel(db, actor, panelId, body.version, 'panel.drilling-saved', 'panel-saved', async (tx) => {
    await repo.replaceDrilling(tx, panelId, body.placements.map(placementDraft), body.bores.map(boreDraft));
    return { details: { placements: body.placements.length, bores: body.bores.length } };
  });
}

/**
 * Marks a panel planned, drilled or checked, at the version the client saw, by the rule of
 * shared/model/panel-status.ts: forward one step at a time, back any number. The panel keeps who marked
 * its current status and when; going back to planned clears both, as a planned panel has no mark. Going
 * back to drilled records the member who went back, then: the activity log keeps the earlier marks.
 */
export function setPanelStatus(db: Database, actor: User, panelId: number, body: z.output<typeof panelStatusBody>): Promise<PanelRecord> {
  return changePanel(db, actor, panelId, body.version, 'panel.status-changed', 'panel-marked', async (_tx, current) => {
    const step = statusStep(current.status, body.status);
    if (!step.ok) throw statusRefused(current, body.status, step.reason);
    const planned = body.status === 'planned';
    return {
      changes: { status: body.status, statusBy: planned ? null : actor.id, statusAt: planned ? null : sql`now()` },
      details: { from: current.status, to: body.status, direction: step.direction },
    };
  });
}

function statusRefused(panel: PanelRow, to: PanelStatus, reason: 'unchanged' | 'skips-a-step'): AppError {
  const fields = { status: reason === 'unchanged' ? `is already "${to}"` : `cannot follow "${panel.status}"` };
  return reason === 'unchanged'
    ? new AppError(409, 'status-unchanged', `“${panel.name}” is already marked ${to}: reload to see who marked it.`, { fields })
    : new AppError(409, 'status-order', `“${panel.name}” is ${panel.status}: a panel is checked only after it is drilled, so mark it drilled first.`, { fields });
}

/** Deletes a panel at the version the client saw; refused while a door or flap hangs on it. */
export async function deletePanel(db: Database, actor: User, panelId: number, version: number): Promise<void> {
  await db.transaction(async (tx) => {
    const current = await repo.findPanel(tx, panelId);
    if (!current) throw notFound(`Panel ${panelId}`);
    await writableJob(tx, current.jobId);
    if (current.version !== version) throw stale(current.version);
    const hangers = (await repo.jobPanelRefs(tx, current.jobId)).filter((p) => p.hang?.on.includes(current.key));
    if (hangers.length > 0) {
      const names = hangers.map((p) => `"${p.name}"`).join(', ');
      throw new AppError(409, 'in-use', `${names} ${hangers.length === 1 ? 'hangs' : 'hang'} on this panel: re-hang or delete ${hangers.length === 1 ? 'it' : 'them'} first.`);
    }
    if (!(await repo.deletePanelAtVersion(tx, panelId, version))) throw stale();
    await touchJob(tx, current.jobId);
    await recordActivity(tx, {
      userId: actor.id,
      jobId: current.jobId,
      panelId,
      action: 'panel.deleted',
      details: { panel: current.key, name: current.name },
    });
    await recordJobEvent(tx, current.jobId, 'panel-deleted', { panelId, by: liveMember(actor) });
  });
}
