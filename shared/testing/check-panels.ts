import { builtinCatalog } from '../catalog/builtin-catalog';
import { checkJob } from '../checks/index';
import type { Finding, FindingCode } from '../checks/finding';
import type { JobDocumentInput } from '../model/job-document';
import { makeJob, type PanelInput } from './make-job';

/** Checks a job of these panels against the built-in catalog. */
export function checkPanels(panels: PanelInput[], fields: Partial<JobDocumentInput> = {}): Finding[] {
  return checkJob(makeJob(panels, fields), builtinCatalog());
}

/** The findings of one code only. */
export function withCode(findings: Finding[], code: FindingCode): Finding[] {
  return findings.filter((f) => f.code === code);
}
