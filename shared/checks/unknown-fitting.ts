import type { DraftFinding } from './finding';
import { report, type PanelSite } from './panel-site';

/** unknown-fitting: a placement whose fitting is not in the catalog; it lays no bores, so nothing of it is checked. */
export function checkUnknownFitting(site: PanelSite): DraftFinding[] {
  return site.layout.unknown.map((p) =>
    report(
      site,
      'unknown-fitting',
      'error',
      `Placement ${p.id} uses fitting "${p.fitting}", which is not in the catalog: its holes are neither drawn nor checked.`,
      [],
      { advice: `Choose a fitting from the catalog, or import "${p.fitting}" as a shop fitting.` },
      [p.id],
    ),
  );
}
