import type { Catalog } from '../catalog/fitting';
import type { JobDocument, Panel } from '../model/job-document';
import type { LengthUnit } from '../units/length-unit';
import { findingKey, type Finding } from './finding';
import { jobSite } from './job-site';
import { checkRun, settleFixes, unsettled } from './settle-fixes';

export { finding, findingCode, severity, type Finding, type FindingCode, type Severity } from './finding';

/** Whether to try each finding's fixes on a copy of the job (the default), or only report, as live checks during an edit do. */
export interface CheckOptions {
  fixes?: boolean;
  /** The unit the messages print lengths in (the reader's choice); millimetres unless told. */
  unit?: LengthUnit;
}

/** The job with this panel in it, as given: an editor's unsaved change is the one checked. */
function withPanel(job: JobDocument, panel: Panel): JobDocument {
  const known = job.panels.some((p) => p.id === panel.id);
  return { ...job, panels: known ? job.panels.map((p) => (p.id === panel.id ? panel : p)) : [...job.panels, panel] };
}

/**
 * Checks one panel of a job (the job gives the system, the limits, the materials, the flaps that hang on it
 * and the other side of its carcass). Findings come worst first in an order that does not depend on the
 * order of the bores, each fix checked on a copy of the job before it is offered.
 */
export function checkPanel(job: JobDocument, panel: Panel, catalog: Catalog, options: CheckOptions = {}): Finding[] {
  const run = checkRun(jobSite(withPanel(job, panel), catalog, options.unit));
  const drafts = run.before(panel.id)?.drafts ?? [];
  return drafts.map((d) => (options.fixes === false ? unsettled(d) : settleFixes(run, d)));
}

/** Checks every panel of a job: the findings of each panel in turn, in the document's panel order. */
export function checkJob(job: JobDocument, catalog: Catalog, options: CheckOptions = {}): Finding[] {
  const run = checkRun(jobSite(job, catalog, options.unit));
  return job.panels.flatMap((panel) => (run.before(panel.id)?.drafts ?? []).map((d) => (options.fixes === false ? unsettled(d) : settleFixes(run, d))));
}

/**
 * One finding of a panel with its fixes tried, as `checkPanel` would give it: for a screen that checks live
 * without fixes and tries them only for the finding the user opens. Undefined when the panel no longer has it.
 */
export function fixesFor(job: JobDocument, panel: Panel, catalog: Catalog, finding: Finding, options: Pick<CheckOptions, 'unit'> = {}): Finding | undefined {
  const run = checkRun(jobSite(withPanel(job, panel), catalog, options.unit));
  const key = findingKey(finding);
  const draft = run.before(panel.id)?.drafts.find((d) => findingKey(d) === key);
  return draft && settleFixes(run, draft);
}
