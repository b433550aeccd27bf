import { nearestGridPoint, type Point } from '../grid/snap';
import { isSameHole, type PanelFaceBore } from '../layout/bore';
import type { PanelSite } from './panel-site';

/** How far to look for a clear hole, in pitches either way. */
const SEARCH_PITCHES = 3;

/**
 * The nearest point of the 32 mm grid where this bore would keep the minimum web to every other bore on
 * its face (but those named in `ignore`, and a hole of its size already there, which it can share) and
 * the minimum distance to the edges. Null when none lies within
 * three pitches or the panel has no grid.
 */
export function nearestClearHole(site: PanelSite, bore: PanelFaceBore, ignore: ReadonlySet<string>): Point | null {
  const { grid, limits, panel, faceBores, index } = site;
  const start = nearestGridPoint(grid, bore);
  if (!start) return null;
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
      if (other.face !== bore.face || ignore.has(other.id) || isSameHole({ ...bore, ...p }, other)) return;
      if (Math.hypot(other.x - p.x, other.y - p.y) - r - other.diameter / 2 < limits.minWeb) clear = false;
    });
    return clear;
  };
  return candidates.find(isClear) ?? null;
}
