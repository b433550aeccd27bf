import { systemGrid, type SystemGrid } from '../grid/system-grid';
import type { PanelBore, PanelEdgeBore, PanelFaceBore } from '../layout/bore';
import { layoutPanel, type PanelLayout } from '../layout/panel-layout';
import type { Panel, ShopLimits, SystemSettings } from '../model/job-document';
import type { DraftFinding, Fix, FindingCode, Severity } from './finding';
import { indexBoxes, type BoxIndex } from './box-index';
import type { JobSite } from './job-site';
import { sortedIds } from './wording';

/** Two face bores, on either face, with the web between them in plan (negative when they overlap). */
export interface NearPair {
  a: PanelFaceBore;
  b: PanelFaceBore;
  web: number;
}

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
  /** The face bores' plan boxes, by their position in `faceBores`. */
  index: BoxIndex;
  /** Every pair of face bores closer in plan than the minimum web, found once for all the checks that need it. */
  nearPairs: NearPair[];
  grid: SystemGrid;
}

/** Whether every number of a bore is finite and its size positive: only such a bore has a place to check. */
export function isMeasurable(bore: PanelBore): boolean {
  const place =
    bore.kind === 'face' ? Number.isFinite(bore.x) && Number.isFinite(bore.y) : Number.isFinite(bore.at) && Number.isFinite(bore.z);
  return place && bore.diameter > 0 && bore.depth > 0 && Number.isFinite(bore.diameter) && Number.isFinite(bore.depth);
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
  const boxes = new Float64Array(4 * faceBores.length);
  for (let i = 0; i < faceBores.length; i++) {
    const { x, y, diameter } = faceBores[i];
    boxes[4 * i] = x - diameter / 2;
    boxes[4 * i + 1] = y - diameter / 2;
    boxes[4 * i + 2] = x + diameter / 2;
    boxes[4 * i + 3] = y + diameter / 2;
  }
  const index = indexBoxes(boxes);
  const sized = [panel.width, panel.height, panel.thickness].every((v) => Number.isFinite(v) && v > 0);
  // The rows start at half the board that adjoins the panel: the carcass's material where known.
  const board = (panel.carcass !== undefined && job.carcassBoard.get(panel.carcass)) || panel.thickness;
  const nearPairs = findNearPairs(faceBores, index, limits.minWeb);
  return { job, panel, limits, system, layout, sized, faceBores, edgeBores, index, nearPairs, grid: systemGrid(panel, board, system) };
}

/** Each pair of face bores whose circles come closer than `gap` in plan, once: one box search per bore. */
function findNearPairs(bores: PanelFaceBore[], index: BoxIndex, gap: number): NearPair[] {
  const pairs: NearPair[] = [];
  let i = 0;
  let a = bores[0];
  const visit = (j: number) => {
    if (j <= i) return;
    const b = bores[j];
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const web = Math.sqrt(dx * dx + dy * dy) - a.diameter / 2 - b.diameter / 2;
    if (web < gap) pairs.push({ a, b, web });
  };
  for (i = 0; i < bores.length; i++) {
    a = bores[i];
    const reach = a.diameter / 2 + gap;
    index.search(a.x - reach, a.y - reach, a.x + reach, a.y + reach, visit);
  }
  return pairs;
}

/** The findings a check makes of each item, the items that are fine giving none. */
export function collect<T>(items: readonly T[], check: (item: T) => DraftFinding | null): DraftFinding[] {
  const findings: DraftFinding[] = [];
  for (const item of items) {
    const finding = check(item);
    if (finding) findings.push(finding);
  }
  return findings;
}

/** What a check proposes beside its words: groups of candidate fixes, made when asked for (see DraftFinding), and advice. */
export interface Remedy {
  candidates?: () => Fix[][];
  advice?: string;
}

/** A finding about these bores (and any further placements), with ids in a fixed order. */
export function report(
  site: PanelSite,
  code: FindingCode,
  severity: Severity,
  message: string,
  bores: readonly PanelBore[],
  remedy: Remedy = {},
  placements: readonly string[] = [],
): DraftFinding {
  const finding: DraftFinding = {
    code,
    severity,
    message,
    panel: site.panel.id,
    bores: sortedIds(...bores.map((b) => b.id)),
    placements: sortedIds(...bores.map((b) => b.placement), ...placements),
    candidates: () => (remedy.candidates?.() ?? []).filter((group) => group.length > 0),
  };
  return remedy.advice ? { ...finding, advice: remedy.advice } : finding;
}
