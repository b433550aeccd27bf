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
  const loose = panel.bores.map((b) => looseBore(b, panel.thickness));
  return { bores: loose.concat(...placed.map((p) => p.bores)), placed, unknown, joined };
}

/** A panel's full bore list: loose bores and expanded placements. */
export function panelBores(panel: Panel, catalog: Catalog, system: SystemSettings): PanelBore[] {
  return layoutPanel(panel, catalog, system).bores;
}
