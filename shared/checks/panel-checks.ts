import type { Panel } from '../model/job-document';
import { checkBoreThrough } from './bore-through';
import { checkBoresOverlap } from './bores-overlap';
import { checkEdgeBoreClash } from './edge-bore-clash';
import { checkEdgeTooClose } from './edge-too-close';
import { checkFacesClash } from './faces-clash';
import { compareFindings, type DraftFinding } from './finding';
import { checkHingeCount } from './hinge-count';
import { checkHingeEndDistance } from './hinge-end-distance';
import { checkHingeUnpaired } from './hinge-unpaired';
import { checkHoleShared } from './hole-shared';
import type { JobSite } from './job-site';
import { checkKeepOutsOverlap } from './keepouts-overlap';
import { checkLiftOutOfRange } from './lift-out-of-range';
import { checkOffGrid } from './off-grid';
import { checkOutsidePanel } from './outside-panel';
import { panelSite, type PanelSite } from './panel-site';
import { checkShelfSag } from './shelf-sag';
import { checkSidesMismatched } from './sides-mismatched';
import { checkUnknownFitting } from './unknown-fitting';

type PanelCheck = (site: PanelSite) => DraftFinding[];

/** Every check a panel gets. */
const PANEL_CHECKS: readonly PanelCheck[] = [
  checkUnknownFitting,
  checkOutsidePanel,
  checkEdgeTooClose,
  checkBoreThrough,
  checkBoresOverlap,
  checkHoleShared,
  checkFacesClash,
  checkEdgeBoreClash,
  checkKeepOutsOverlap,
  checkOffGrid,
  checkHingeCount,
  checkHingeUnpaired,
  checkHingeEndDistance,
  checkSidesMismatched,
  checkLiftOutOfRange,
  checkShelfSag,
];

/** A panel without a drillable size can only be told so. */
const UNSIZED_CHECKS: readonly PanelCheck[] = [checkUnknownFitting, checkOutsidePanel];

/** What the checks make of one panel before its fixes are tried: worst first, in an order that does not depend on the order of the bores. */
export interface PanelDrafts {
  /** Whether every hole of the panel could be checked: a drillable size and no fitting missing from the catalog. */
  checkable: boolean;
  drafts: DraftFinding[];
  site: PanelSite;
}

/** Runs every check on one panel of a job. */
export function draftPanel(job: JobSite, panel: Panel): PanelDrafts {
  const site = panelSite(job, panel);
  const drafts: DraftFinding[] = [];
  for (const check of site.sized ? PANEL_CHECKS : UNSIZED_CHECKS) drafts.push(...check(site));
  return { checkable: site.sized && site.layout.unknown.length === 0, drafts: drafts.sort(compareFindings), site };
}
