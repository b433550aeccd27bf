import type { JobDetail } from '../../../shared/api/contract';
import type { Catalog } from '../../../shared/catalog/fitting';
import { cautionsFor, type CautionId } from '../../../shared/export/cautions';
import { JOB_FORMAT, type JobDocument, type Panel } from '../../../shared/model/job-document';

/** A job's detail as the job document the shared cautions read. */
export function jobDocumentOf(detail: JobDetail): JobDocument {
  const { job, materials, system, limits, carcasses, panels } = detail;
  return { format: JOB_FORMAT, name: job.name, materials, system, limits, carcasses, panels };
}

/**
 * The cautions of the units a screen shows: the whole job, or one panel's carcass (a panel in no
 * carcass answers for itself). Drilling's own caution stays with the bench and the pack.
 */
export function cautionsOfUnits(job: JobDocument, catalog: Catalog, panel?: Panel): CautionId[] {
  const scoped =
    panel === undefined
      ? job
      : {
          ...job,
          carcasses: job.carcasses.filter((c) => c.id === panel.carcass),
          panels: panel.carcass === undefined ? [panel] : job.panels.filter((p) => p.carcass === panel.carcass),
        };
  return cautionsFor(scoped, catalog)
    .map((c) => c.id)
    .filter((id) => id !== 'drilling');
}
