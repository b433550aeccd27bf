import { isOnGridColumn, isOnGridHeight, nearestGridPoint, type Point } from '../grid/snap';
import type { PanelFaceBore } from '../layout/bore';
import type { PlacedFitting } from '../layout/panel-layout';
import type { DraftFinding, Fix } from './finding';
import { cupsMeeting } from './hinge-pairs';
import { GRID_TOLERANCE } from '../grid/system-grid';
import { collect, isMeasurable, report, type PanelSite } from './panel-site';
import { boreName, capitalize, placementName } from './wording';

/**
 * The rows a placement may follow besides the panel's 32 mm grid. A mounting plate for an inset door sits
 * on a row of its own, the front row plus the door's thickness (trade-reference §2, Popular Woodworking 2006,
 * published). On a panel that is not line-bored (a top or bottom, which carries a flap's plates) a plate's
 * height follows its hinge, not a system hole; hinge-unpaired checks that it meets its cup.
 */
interface FittingRows {
  columns: number[];
  freeHeight: boolean;
}

function fittingRows(site: PanelSite, placed: PlacedFitting): FittingRows {
  if (placed.fitting.purpose !== 'mounting-plate') return { columns: [], freeHeight: false };
  const insetDoors = (site.job.hungOn.get(site.panel.id) ?? []).filter((front) =>
    front.placements.some((p) => {
      const fitting = site.job.catalog.get(p.fitting);
      return fitting?.purpose === 'hinge-cup' && fitting.hinge.overlay === 'inset';
    }),
  );
  const lineBored = site.panel.role === 'side' || site.panel.role === 'loose';
  return { columns: insetDoors.map((door) => site.system.setback + door.thickness), freeHeight: !lineBored };
}

function onRows(site: PanelSite, rows: FittingRows, p: Point): boolean {
  const column = isOnGridColumn(site.grid, p.x) || rows.columns.some((c) => Math.abs(c - p.x) <= GRID_TOLERANCE);
  return column && (rows.freeHeight || isOnGridHeight(site.grid, p.y));
}

/** Where a stray hole belongs: the nearest grid point, or the nearest row of the fitting's own where that is nearer. */
function nearestRowPoint(site: PanelSite, rows: FittingRows, bore: PanelFaceBore): Point | null {
  const grid = nearestGridPoint(site.grid, bore);
  if (!grid) return null;
  const x = [grid.x, ...rows.columns].reduce((a, b) => (Math.abs(b - bore.x) < Math.abs(a - bore.x) ? b : a));
  return { x, y: rows.freeHeight ? bore.y : grid.y };
}

/** The fixes that shift a placement (and, for a plate, the cups it meets) by a vector: the nearest rows, then a pitch either way. */
function shifts(site: PanelSite, placed: PlacedFitting, first: Point, target: Point): Fix[] {
  const { placement } = placed;
  const { pitch } = site.system;
  const cups = placed.fitting.purpose === 'mounting-plate' ? cupsMeeting(site.job, site.panel, placement) : [];
  return [0, pitch, -pitch].flatMap((dy) => {
    const shift = { x: target.x - first.x, y: target.y - first.y + dy };
    const at = { x: placement.x + shift.x, y: placement.y + shift.y };
    const moveIt: Fix = {
      message: `Move ${placementName(placed)} to x ${site.job.coordinate(at.x)}, y ${site.job.coordinate(at.y)} so its holes fall on system holes.`,
      edits: [{ kind: 'move-placement', panel: site.panel.id, placement: placement.id, ...at }],
    };
    if (cups.length === 0 || shift.y === 0) return [moveIt];
    // A plate that moves up or down takes its hinges with it, or the fix would part them.
    const withCups: Fix = {
      message: `Move ${placementName(placed)} to x ${site.job.coordinate(at.x)}, y ${site.job.coordinate(at.y)} and the hinge${cups.length > 1 ? 's' : ''} it meets ${site.job.length(Math.abs(shift.y))} ${shift.y > 0 ? 'up' : 'down'} with it (${cups.map((c) => `${c.cup.id} on ${c.front.id}`).join(', ')}).`,
      edits: [
        ...moveIt.edits,
        ...cups.map(({ front, cup }) => ({ kind: 'move-placement' as const, panel: front.id, placement: cup.id, x: cup.x, y: cup.y + shift.y })),
      ],
    };
    return [moveIt, withCups];
  });
}

function finding(site: PanelSite, placed: PlacedFitting): DraftFinding | null {
  const rows = fittingRows(site, placed);
  const holes = placed.bores.filter((b): b is PanelFaceBore => b.kind === 'face' && isMeasurable(b));
  const off = holes.filter((b) => !onRows(site, rows, b));
  if (off.length === 0) return null;
  const first = off[0];
  const name = placementName(placed);
  const target = nearestRowPoint(site, rows, first);
  if (!target) {
    const message = `${capitalize(name)} belongs on a system row, but the panel is too small for one.`;
    return report(site, 'off-grid', 'warning', message, off);
  }
  const distance = Math.hypot(target.x - first.x, target.y - first.y);
  const message = `${capitalize(name)} is off the 32 mm grid: ${boreName(first)} sits at x ${site.job.coordinate(first.x)}, y ${site.job.coordinate(first.y)}, ${site.job.length(distance)} from the nearest system hole.`;
  return report(site, 'off-grid', 'warning', message, off, {
    candidates: () => [shifts(site, placed, first, target)],
    advice: `Move it so its holes fall on system holes, ${site.job.system(site.grid.pitch)} apart from x ${site.job.coordinate(site.grid.setback)}, y ${site.job.coordinate(site.grid.firstY)}, and move what it meets with it.`,
  });
}

/**
 * off-grid: a fitting meant for a system row (mounting plates, shelf pins, runners, lift mechanisms)
 * whose face bores miss the rows it could mean: the panel's 32 mm grid (x a whole number of pitches behind
 * the front row, y a whole number of pitches above half the adjoining board) or a row of the fitting's own
 * (see FittingRows). A placement 1 mm off any of them is still reported.
 */
export function checkOffGrid(site: PanelSite): DraftFinding[] {
  return collect(
    site.layout.placed.filter((p) => p.fitting.onSystemRow),
    (p) => finding(site, p),
  );
}
