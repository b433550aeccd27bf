import { JOB_FORMAT, jobDocument, type JobDocument } from '../model/job-document';
import type { CarcassPlan } from './plan-carcass';

/**
 * The job document of a planned carcass alone: its system, limits, the materials its panels use, the
 * carcass and its panels, validated by the job document's own schema.
 */
export function planToJob(plan: CarcassPlan): JobDocument {
  const used = new Set([plan.carcass.material, ...plan.panels.map((p) => p.material)]);
  return jobDocument.parse({
    format: JOB_FORMAT,
    name: plan.carcass.name,
    system: plan.input.system,
    limits: plan.input.limits,
    materials: plan.input.materials.filter((m) => used.has(m.id)),
    carcasses: [plan.carcass],
    panels: plan.panels,
  });
}
