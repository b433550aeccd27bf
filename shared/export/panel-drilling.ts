import type { Catalog } from '../catalog/fitting';
import type { PanelBore } from '../layout/bore';
import { panelBores } from '../layout/panel-layout';
import type { JobDocument, Panel } from '../model/job-document';

/** A panel with its full bore list, laid out once and shared by every export of a run. */
export interface PanelDrilling {
  panel: Panel;
  bores: PanelBore[];
}

/** Lays out every panel of a job, in the document's order. */
export function jobDrilling(job: JobDocument, catalog: Catalog): PanelDrilling[] {
  return job.panels.map((panel) => ({ panel, bores: panelBores(panel, catalog, job.system) }));
}
