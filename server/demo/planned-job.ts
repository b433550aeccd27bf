import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { DEFAULT_MATERIALS } from '../../shared/model/default-materials';
import { JOB_FORMAT, type JobDocumentInput } from '../../shared/model/job-document';
import { planCarcass } from '../../shared/planner/plan-carcass';
import type { CarcassPlanInputData } from '../../shared/planner/carcass-plan-input';

/**
 * A demo job made the way a designer makes one: each carcass described and planned by the carcass
 * planner, so the demo's hinges, plates, mechanisms and rows come from the same rules as a real job's.
 */
export function plannedJob(
  job: { name: string; client: string; notes: string },
  carcasses: readonly CarcassPlanInputData[],
): JobDocumentInput {
  const catalog = builtinCatalog();
  const plans = carcasses.map((input) => {
    const result = planCarcass(input, catalog);
    if (!result.ok) throw new Error(`demo carcass "${input.name}" cannot be planned:\n${result.errors.join('\n')}`);
    return result.plan;
  });
  return {
    format: JOB_FORMAT,
    ...job,
    materials: [...DEFAULT_MATERIALS],
    carcasses: plans.map((p) => p.carcass),
    panels: plans.flatMap((p) => p.panels),
  };
}
