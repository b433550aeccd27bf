import type { Catalog, Fitting } from '../catalog/fitting';
import type { Panel, Placement, SystemSettings } from '../model/job-document';
import { looseBore, type PanelBore } from './bore';
import { expandPlacement, expandedBoreId } from './expand-placement';
import { placeKeepOuts, type PanelKeepOut } from './keep-out';

/** A placement whose fitting is in the catalog, with what it lays on the panel. */
export interface PlacedFitting {
  placement: Placement;
  fitting: Fitting;
  bores: PanelBore[];
  keepOuts: PanelKeepOut[];
}

/** Everything a panel's drilling comes to. */
export interface PanelLayout {
  /** Loose bores first, then each placement's, in document order. */
  bores: PanelBore[];
  placed: PlacedFitting[];
  /** Placements whose fitting is not in the catalog: they lay nothing. */
  unknown: Placement[];
  /** Pairs of bores a fitting is made to join, as `pairKey`s. */
  joined: ReadonlySet<string>;
}

/** A key for an unordered pair of bore ids. */
export function pairKey(a: string, b: string): string {
  return a < b ? `${a}\n${b}` : `${b}\n${a}`;
}

/** Lays out a panel's drilling: its loose bores plus every placement expanded through the catalog. */
export function layoutPanel(panel: Panel, catalog: Catalog, system: SystemSettings): PanelLayout {
  const placed: PlacedFitting[] = [];
  const unknown: Placement[] = [];
  const joined = new Set<string>();
  for (const placement of panel.placements) {
    const fitting = catalog.get(placement.fitting);
    if (!fitting) {
      unknown.push(placement);
      continue;
    }
    const bores = expandPlacement(placement, fitting, panel, system);
    for (const [a, b] of fitting.joins) joined.add(pairKey(expandedBoreId(placement.id, a), expandedBoreId(placement.id, b)));
    placed.push({ placement, fitting, bores, keepOuts: placeKeepOuts(placement, fitting) });
  }
  return { bores: looseBores(panel).concat(...placed.map((p) => p.bores)), placed, unknown, joined };
}

/** The loose bores laid out, by the panel's bore list they came from (documents are immutable, so one list lays out one way per thickness). */
const laidOut = new WeakMap<Panel['bores'], { thickness: number; bores: PanelBore[] }>();

/**
 * The panel's own bores as the layout lists them, laid out once for each list of bores: a drag moves
 * placements and keeps the list, so that a panel of thousands of holes does not lay them all out again
 * on every move. The bores given out are never changed by those who read them.
 */
function looseBores(panel: Panel): PanelBore[] {
  const known = laidOut.get(panel.bores);
  if (known && known.thickness === panel.thickness) return known.bores;
  const bores = panel.bores.map((b) => looseBore(b, panel.thickness));
  laidOut.set(panel.bores, { thickness: panel.thickness, bores });
  return bores;
}

/** A panel's full bore list: loose bores and expanded placements. */
export function panelBores(panel: Panel, catalog: Catalog, system: SystemSettings): PanelBore[] {
  return layoutPanel(panel, catalog, system).bores;
}
