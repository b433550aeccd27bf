import type { SystemSettings } from '../model/job-document';

/** Below this a length counts as equal: far finer than any drill, coarser than floating-point noise. */
export const GRID_TOLERANCE = 0.01;

/**
 * The 32 mm system laid on one panel, in the panel's frame seen on face A (design.md §3):
 * x from the reference (front) edge, y from the lower edge.
 */
export interface SystemGrid {
  pitch: number;
  setback: number;
  /** y of the lowest hole: half the thickness of the board that adjoins the panel there. */
  firstY: number;
  /** y of the highest hole, as far below the top as `firstY` is above the bottom on a balanced side; below `firstY` when no hole fits. */
  lastY: number;
  /** x of the line-bored rows: the front row and, where the depth allows, the rear row. */
  rows: number[];
  /** x of the last grid column that fits the panel (below `setback` when none does): runners and other fittings use columns between the rows. */
  lastX: number;
}

/**
 * The system rows of a panel. The front row sits at the setback from the reference edge; the rear row
 * at the largest multiple of the pitch behind it that keeps `rearSetback` (by default the setback itself,
 * leaving room for a back panel's groove) to the back edge. Holes start at half the adjoining board's
 * thickness, as the 32 mm system's balanced sides do (trade-reference §1). A panel too small for a row
 * gets none.
 */
export function systemGrid(
  panel: { width: number; height: number },
  boardThickness: number,
  system: SystemSettings,
  rearSetback = system.setback,
): SystemGrid {
  const { pitch, setback } = system;
  const firstY = boardThickness / 2;
  const rowsUp = Math.floor((panel.height - 2 * firstY) / pitch + GRID_TOLERANCE / pitch);
  const stepsBack = Math.floor((panel.width - rearSetback - setback) / pitch + GRID_TOLERANCE / pitch);
  const rows = setback + system.holeDiameter / 2 <= panel.width ? [setback] : [];
  if (rows.length > 0 && stepsBack >= 1) rows.push(setback + stepsBack * pitch);
  const columnsBack = Math.floor((panel.width - setback) / pitch + GRID_TOLERANCE / pitch);
  return {
    pitch,
    setback,
    firstY,
    lastY: firstY + rowsUp * pitch,
    rows,
    lastX: setback + columnsBack * pitch,
  };
}

/** The y of every hole on a system row, bottom to top. */
export function holeHeights(grid: SystemGrid): number[] {
  const count = Math.round((grid.lastY - grid.firstY) / grid.pitch) + 1;
  return Array.from({ length: Math.max(count, 0) }, (_, k) => grid.firstY + k * grid.pitch);
}
