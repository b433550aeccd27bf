import type { Catalog } from '../catalog/fitting';
import type { JobDocument, Panel } from '../model/job-document';
import { checkBoreThrough } from './bore-through';
import { checkBoresOverlap } from './bores-overlap';
import { checkEdgeBoreClash } from './edge-bore-clash';
import { checkEdgeTooClose } from './edge-too-close';
import { checkFacesClash } from './faces-clash';
import { compareFindings, type Finding } from './finding';
import { checkHingeCount } from './hinge-count';
import { checkHingeUnpaired } from './hinge-unpaired';
import { jobSite, type JobSite } from './job-site';
import { checkKeepOutsOverlap } from './keepouts-overlap';
import { checkLiftOutOfRange } from './lift-out-of-range';
import { checkOffGrid } from './off-grid';
import { checkOutsidePanel } from './outside-panel';
import { panelSite, type PanelSite } from './panel-site';
import { checkShelfSag } from './shelf-sag';
import { checkUnknownFitting } from './unknown-fitting';

export { finding, findingCode, severity, type Finding, type FindingCode, type Severity } from './finding';

type PanelCheck = (site: PanelSite) => Finding[];

/** Every check a panel gets. */
const PANEL_CHECKS: readonly PanelCheck[] = [
  checkUnknownFitting,
  checkOutsidePanel,
  checkEdgeTooClose,
  checkBoreThrough,
  checkBoresOverlap,
  checkFacesClash,
  checkEdgeBoreClash,
  checkKeepOutsOverlap,
  checkOffGrid,
  checkHingeCount,
  checkHingeUnpaired,
  checkLiftOutOfRange,
  checkShelfSag,
];

/** A panel without a drillable size can only be told so. */
const UNSIZED_CHECKS: readonly PanelCheck[] = [checkUnknownFitting, checkOutsidePanel];

function checkPanelIn(job: JobSite, panel: Panel): Finding[] {
  const site = panelSite(job, panel);
  const findings: Finding[] = [];
  for (const check of site.sized ? PANEL_CHECKS : UNSIZED_CHECKS) findings.push(...check(site));
  return findings.sort(compareFindings);
}

/**
 * Checks one panel of a job (the job gives the system, the limits, the materials and the flaps that hang
 * on it). Findings come worst first in an order that does not depend on the order of the bores.
 */
export function checkPanel(job: JobDocument, panel: Panel, catalog: Catalog): Finding[] {
  return checkPanelIn(jobSite(job, catalog), panel);
}

/** Checks every panel of a job: the findings of each panel in turn, in the document's panel order. */
export function checkJob(job: JobDocument, catalog: Catalog): Finding[] {
  const site = jobSite(job, catalog);
  const findings: Finding[] = [];
  for (const panel of job.panels) findings.push(...checkPanelIn(site, panel));
  return findings;
}
