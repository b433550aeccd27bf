import Flatbush from 'flatbush';
import { systemGrid, type SystemGrid } from '../grid/system-grid';
import type { PanelBore, PanelEdgeBore, PanelFaceBore } from '../layout/bore';
import { layoutPanel, type PanelLayout } from '../layout/panel-layout';
import type { Panel, ShopLimits, SystemSettings } from '../model/job-document';
import type { Finding, FindingCode, Severity } from './finding';
import type { JobSite } from './job-site';
import { sortedIds } from './wording';

/** One panel made ready for the checks: its layout, its grid and a spatial index of its face bores. */
export interface PanelSite {
  job: JobSite;
  panel: Panel;
  limits: ShopLimits;
  system: SystemSettings;
  layout: PanelLayout;
  /** False when the panel's own size is not a drillable board (NaN, zero or negative). */
  sized: boolean;
  /** Face and edge bores whose numbers are all finite; the others are reported as outside the panel. */
  faceBores: PanelFaceBore[];
  edgeBores: PanelEdgeBore[];
  /** The face bores' plan boxes, by their index in `faceBores`; null when there are none. */
  index: Flatbush | null;
  grid: SystemGrid;
}

const finite = (...values: number[]) => values.every(Number.isFinite);

/** Whether every number of a bore is finite and its size positive: only such a bore has a place to check. */
export function isMeasurable(bore: PanelBore): boolean {
  const place = bore.kind === 'face' ? finite(bore.x, bore.y) : finite(bore.at, bore.z);
  return place && bore.diameter > 0 && bore.depth > 0 && finite(bore.diameter, bore.depth);
}

/** Lays out a panel and indexes its face bores, so that no check has to compare every pair. */
export function panelSite(job: JobSite, panel: Panel): PanelSite {
  const { system, limits } = job.job;
  const layout = layoutPanel(panel, job.catalog, system);
  const faceBores: PanelFaceBore[] = [];
  const edgeBores: PanelEdgeBore[] = [];
  for (const bore of layout.bores) {
    if (!isMeasurable(bore)) continue;
    if (bore.kind === 'face') faceBores.push(bore);
    else edgeBores.push(bore);
  }
  let index: Flatbush | null = null;
  if (faceBores.length > 0) {
    index = new Flatbush(faceBores.length);
    for (const b of faceBores) index.add(b.x - b.diameter / 2, b.y - b.diameter / 2, b.x + b.diameter / 2, b.y + b.diameter / 2);
    index.finish();
  }
  const sized = [panel.width, panel.height, panel.thickness].every((v) => Number.isFinite(v) && v > 0);
  // The rows start at half the board that adjoins the panel: the carcass's material where known.
  const board = (panel.carcass !== undefined && job.carcassBoard.get(panel.carcass)) || panel.thickness;
  return { job, panel, limits, system, layout, sized, faceBores, edgeBores, index, grid: systemGrid(panel, board, system) };
}

/**
 * Visits once each pair of face bores whose circles come closer than `gap` in plan (web < gap), on either
 * face, with the web between them (negative when they overlap). The index keeps this near-linear.
 */
export function forEachNearPair(
  site: PanelSite,
  gap: number,
  visit: (a: PanelFaceBore, b: PanelFaceBore, web: number) => void,
): void {
  const { faceBores: bores, index } = site;
  if (!index) return;
  for (let i = 0; i < bores.length; i++) {
    const a = bores[i];
    const reach = a.diameter / 2 + gap;
    // The filter does the work and keeps nothing, so the search allocates no result list.
    index.search(a.x - reach, a.y - reach, a.x + reach, a.y + reach, (j) => {
      if (j <= i) return false;
      const b = bores[j];
      const dx = b.x - a.x;
      const dy = b.y - a.y;
      const web = Math.sqrt(dx * dx + dy * dy) - a.diameter / 2 - b.diameter / 2;
      if (web < gap) visit(a, b, web);
      return false;
    });
  }
}

/** A finding about these bores (and any further placements), with ids in a fixed order. */
export function report(
  site: PanelSite,
  code: FindingCode,
  severity: Severity,
  message: string,
  bores: readonly PanelBore[],
  fix?: Finding['fix'],
  placements: readonly string[] = [],
): Finding {
  const finding: Finding = {
    code,
    severity,
    message,
    panel: site.panel.id,
    bores: sortedIds(...bores.map((b) => b.id)),
    placements: sortedIds(...bores.map((b) => b.placement), ...placements),
  };
  return fix ? { ...finding, fix } : finding;
}
