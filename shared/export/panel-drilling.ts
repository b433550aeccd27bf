import type { Catalog } from '../catalog/fitting';
import type { Finding } from '../checks/finding';
import { panelBores } from '../layout/panel-layout';
import { panelHands, type SideHand } from '../layout/side-hand';
import type { JobDocument, Panel } from '../model/job-document';
import { panelHoles, type PanelHole } from './panel-holes';

/** A panel with its holes, laid out once and shared by every file of a run, and what its files must say of it. */
export interface PanelDrilling {
  panel: Panel;
  /** Each hole once, whoever needs it: what the map, the templates, the DXF and the hole schedule all draw. */
  holes: PanelHole[];
  /** Errors the checks found on this panel: its files say "has errors" when there are any. */
  errors: number;
  /** Which side of its carcass a side panel is, or a door is hinged on, when the job tells it. */
  hand?: SideHand;
}

/** Counts the errors among findings by the panel they concern. */
function errorsByPanel(findings: readonly Finding[]): Map<string, number> {
  const errors = new Map<string, number>();
  for (const f of findings) if (f.severity === 'error') errors.set(f.panel, (errors.get(f.panel) ?? 0) + 1);
  return errors;
}

function drillingOf(job: JobDocument, catalog: Catalog, panel: Panel, errors: ReadonlyMap<string, number>, hands: ReadonlyMap<string, SideHand>): PanelDrilling {
  const hand = hands.get(panel.id);
  const drilling: PanelDrilling = { panel, holes: panelHoles(panelBores(panel, catalog, job.system)), errors: errors.get(panel.id) ?? 0 };
  return hand ? { ...drilling, hand } : drilling;
}

/** Lays out one panel of a job with the errors among `findings` that concern it (a download of one panel's file). */
export function panelDrilling(job: JobDocument, catalog: Catalog, panel: Panel, findings: readonly Finding[]): PanelDrilling {
  return drillingOf(job, catalog, panel, errorsByPanel(findings), panelHands(job));
}

/** Lays out every panel of a job, in the document's order, with the errors among `findings` that concern each. */
export function jobDrilling(job: JobDocument, catalog: Catalog, findings: readonly Finding[]): PanelDrilling[] {
  const errors = errorsByPanel(findings);
  const hands = panelHands(job);
  return job.panels.map((panel) => drillingOf(job, catalog, panel, errors, hands));
}
