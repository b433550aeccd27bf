import { nearestGridPoint, type Point } from '../grid/snap';
import { isSameHole, type PanelFaceBore } from '../layout/bore';
import type { PanelSite } from './panel-site';

/** How far to look for a clear hole, in pitches either way. */
const SEARCH_PITCHES = 3;

/**
 * Whether a hole already there can take this bore too: only where one of the two is a loose bore, a
 * line-bored system hole that locates whatever goes into it. Two fittings never share a hole
 * (trade-reference §8a, common practice).
 */
export function canShareHole(a: PanelFaceBore, b: PanelFaceBore): boolean {
  return a.placement === undefined || b.placement === undefined;
}

/**
 * The points of the 32 mm grid within three pitches, nearest first, where this bore would keep the minimum
 * web to every other bore on its face (but those named in `ignore`, and a line-bored hole of its size it can
 * share) and the minimum distance to the edges. Empty when the panel has no grid.
 */
export function clearHoles(site: PanelSite, bore: PanelFaceBore, ignore: ReadonlySet<string>): Point[] {
  const { grid, limits, panel, faceBores, index } = site;
  const start = nearestGridPoint(grid, bore);
  if (!start) return [];
  const r = bore.diameter / 2;
  const candidates: Point[] = [];
  for (let i = -SEARCH_PITCHES; i <= SEARCH_PITCHES; i++) {
    for (let j = -SEARCH_PITCHES; j <= SEARCH_PITCHES; j++) {
      const x = start.x + i * grid.pitch;
      const y = start.y + j * grid.pitch;
      const inside = x >= grid.setback && x <= grid.lastX && y >= grid.firstY && y <= grid.lastY;
      const clearOfEdges = x - r >= limits.minEdge && y - r >= limits.minEdge && panel.width - x - r >= limits.minEdge && panel.height - y - r >= limits.minEdge;
      if (inside && clearOfEdges) candidates.push({ x, y });
    }
  }
  const distance = (p: Point) => (p.x - bore.x) ** 2 + (p.y - bore.y) ** 2;
  candidates.sort((a, b) => distance(a) - distance(b) || a.x - b.x || a.y - b.y);
  const reach = r + limits.minWeb;
  const isClear = (p: Point) => {
    let clear = true;
    index.search(p.x - reach, p.y - reach, p.x + reach, p.y + reach, (k) => {
      const other = faceBores[k];
      if (other.face !== bore.face || ignore.has(other.id)) return;
      if (isSameHole({ ...bore, ...p }, other) && canShareHole(bore, other)) return;
      if (Math.hypot(other.x - p.x, other.y - p.y) - r - other.diameter / 2 < limits.minWeb) clear = false;
    });
    return clear;
  };
  return candidates.filter(isClear);
}
