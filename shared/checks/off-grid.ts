import { isOnGrid, nearestGridPoint } from '../grid/snap';
import type { PanelFaceBore } from '../layout/bore';
import type { PlacedFitting } from '../layout/panel-layout';
import type { Finding } from './finding';
import { collect, isMeasurable, report, type PanelSite } from './panel-site';
import { boreName, capitalize, formatNumber, mm, placementName } from './wording';

function finding(site: PanelSite, placed: PlacedFitting): Finding | null {
  const { grid } = site;
  const holes = placed.bores.filter((b): b is PanelFaceBore => b.kind === 'face' && isMeasurable(b));
  const off = holes.filter((b) => !isOnGrid(grid, b));
  if (off.length === 0) return null;
  const { placement } = placed;
  const first = off[0];
  const target = nearestGridPoint(grid, first);
  const name = placementName(placed);
  if (!target) {
    const message = `${capitalize(name)} belongs on a system row, but the panel is too small for one.`;
    return report(site, 'off-grid', 'warning', message, off);
  }
  const distance = Math.hypot(target.x - first.x, target.y - first.y);
  const message = `${capitalize(name)} is off the 32 mm grid: ${boreName(first)} sits at x ${formatNumber(first.x)}, y ${formatNumber(first.y)}, ${mm(distance)} from the nearest system hole.`;
  // Moving the whole placement by the first stray hole's offset puts a fitting drawn on the pitch back on the grid.
  const shift = { x: target.x - first.x, y: target.y - first.y };
  const fits = holes.every((b) => isOnGrid(grid, { x: b.x + shift.x, y: b.y + shift.y }));
  const at = { x: placement.x + shift.x, y: placement.y + shift.y };
  const fix = fits
    ? { message: `Move it to x ${formatNumber(at.x)}, y ${formatNumber(at.y)} so its holes fall on system holes.`, at }
    : { message: `Move it so its holes fall on system holes, ${mm(grid.pitch)} apart from x ${formatNumber(grid.setback)}, y ${formatNumber(grid.firstY)}.` };
  return report(site, 'off-grid', 'warning', message, off, fix);
}

/**
 * off-grid: a fitting meant for a system row (mounting plates, shelf pins, runners, lift mechanisms)
 * whose face bores miss the panel's 32 mm grid: x a whole number of pitches behind the front row,
 * y a whole number of pitches above half the adjoining board.
 */
export function checkOffGrid(site: PanelSite): Finding[] {
  return collect(
    site.layout.placed.filter((p) => p.fitting.onSystemRow),
    (p) => finding(site, p),
  );
}
