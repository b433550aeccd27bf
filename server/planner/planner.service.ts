import type { PlannedCarcass } from '../../shared/api/plan-contract';
import type { User } from '../../shared/api/contract';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { planCarcass } from '../../shared/planner/plan-carcass';
import { recordActivity } from '../activity/activity.repository';
import type { Database } from '../db/client';
import { boreDraft, panelDraft, placementDraft, toCarcass } from '../db/job-mapping';
import { AppError, notFound } from '../http/app-error';
import { carcassKeys, findJob, insertCarcass, touchJob } from '../jobs/jobs.repository';
import * as panels from '../panels/panels.repository';

/**
 * Plans a carcass with the job's own materials, system and limits, and adds it with all its panels,
 * their drilling and their hang relations in one transaction: either the whole carcass is added or
 * nothing is. A description the planner refuses answers 400 with every problem led by its path.
 */
export async function addPlannedCarcass(db: Database, actor: User, jobId: number, body: unknown): Promise<PlannedCarcass> {
  return db.transaction(async (tx) => {
    const job = await findJob(tx, jobId);
    if (!job) throw notFound(`Job ${jobId}`);
    const description = typeof body === 'object' && body !== null ? body : {};
    const result = planCarcass({ ...description, materials: job.materials, system: job.system, limits: job.limits }, builtinCatalog());
    if (!result.ok) throw new AppError(400, 'invalid-input', `The carcass cannot be planned: ${result.errors[0]}`, { details: result.errors });
    const { plan } = result;
    if ((await carcassKeys(tx, jobId)).has(plan.carcass.id)) {
      throw new AppError(409, 'duplicate-id', `id: this job already has a carcass "${plan.carcass.id}"; give the new one an id of its own.`, {
        fields: { id: 'is already used in this job' },
      });
    }
    const taken = new Set((await panels.jobPanelRefs(tx, jobId)).map((p) => p.key));
    const clash = plan.panels.find((p) => taken.has(p.id));
    if (clash) throw new AppError(409, 'duplicate-id', `id: this job already has a panel "${clash.id}"; give the carcass another id.`, { fields: { id: 'is already used in this job' } });
    const { id: key, ...fields } = plan.carcass;
    const row = await insertCarcass(tx, jobId, { ...fields, key });
    const ids: number[] = [];
    for (const p of plan.panels) {
      const panelId = await panels.insertPanel(tx, { ...panelDraft(p), jobId, carcassId: row.id });
      await panels.insertDrilling(tx, panelId, p.placements.map(placementDraft), p.bores.map(boreDraft));
      ids.push(panelId);
    }
    await touchJob(tx, jobId);
    await recordActivity(tx, { userId: actor.id, jobId, action: 'carcass.planned', details: { carcass: key, name: row.name, panels: ids.length } });
    const records = [];
    for (const id of ids) {
      const record = await panels.loadPanelRecord(tx, id);
      if (record) records.push(record);
    }
    return { carcass: toCarcass(row), panels: records };
  });
}
