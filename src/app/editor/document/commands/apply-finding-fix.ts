import { applyFix, editedPanels } from '../../../../../shared/checks/apply-fix';
import type { Fix } from '../../../../../shared/checks/finding';
import type { Catalog } from '../../../../../shared/catalog/fitting';
import type { JobDocument, Panel } from '../../../../../shared/model/job-document';

export interface ApplyFindingFixParams {
  fix: Fix;
  /** The job the panel belongs to: a mirror fix reads the other side from it. */
  job: JobDocument;
  catalog: Catalog;
}

/** Whether a fix changes only this panel, so that the panel's editor can apply it as one of its own steps. */
export function fixStaysOnPanel(fix: Fix, panelId: string): boolean {
  return editedPanels(fix).every((id) => id === panelId);
}

/**
 * Applies a finding's fix to the panel, exactly as the checks tried it before offering it (shared applyFix).
 * A fix that reaches other panels, or names what the panel no longer has, leaves it as it is.
 */
export function applyFindingFix(panel: Panel, { fix, job, catalog }: ApplyFindingFixParams): Panel {
  if (!fixStaysOnPanel(fix, panel.id)) return panel;
  const withPanel = { ...job, panels: job.panels.map((p) => (p.id === panel.id ? panel : p)) };
  return applyFix(withPanel, catalog, fix)?.panels.find((p) => p.id === panel.id) ?? panel;
}
