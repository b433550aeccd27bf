import type { Catalog } from '../catalog/fitting';
import type { JobDocument, Panel } from '../model/job-document';
import type { Finding } from './finding';
import { jobSite } from './job-site';
import { draftsOf, settleFixes } from './settle-fixes';

export { finding, findingCode, severity, type Finding, type FindingCode, type Severity } from './finding';

/**
 * Checks one panel of a job (the job gives the system, the limits, the materials, the flaps that hang on it
 * and the other side of its carcass). Findings come worst first in an order that does not depend on the
 * order of the bores, each fix checked on a copy of the job before it is offered.
 */
export function checkPanel(job: JobDocument, panel: Panel, catalog: Catalog): Finding[] {
  // The panel as given may differ from the job's copy of it (an editor's unsaved change): that is the one checked.
  const known = job.panels.some((p) => p.id === panel.id);
  const panels = known ? job.panels.map((p) => (p.id === panel.id ? panel : p)) : [...job.panels, panel];
  const site = jobSite({ ...job, panels }, catalog);
  const before = draftsOf(site);
  return before(panel.id).drafts.map((d) => settleFixes(site, before, d));
}

/** Checks every panel of a job: the findings of each panel in turn, in the document's panel order. */
export function checkJob(job: JobDocument, catalog: Catalog): Finding[] {
  const site = jobSite(job, catalog);
  const before = draftsOf(site);
  return job.panels.flatMap((panel) => before(panel.id).drafts.map((d) => settleFixes(site, before, d)));
}
