import { GRID_TOLERANCE, type SystemGrid } from './system-grid';

export interface Point {
  x: number;
  y: number;
}

/** The step of `from + k·pitch` (k from 0 to `steps`) nearest to `value`. */
function nearestStep(value: number, from: number, pitch: number, steps: number): number {
  const k = Math.min(Math.max(Math.round((value - from) / pitch), 0), steps);
  return from + k * pitch;
}

function onStep(value: number, from: number, pitch: number, to: number): boolean {
  if (value < from - GRID_TOLERANCE || value > to + GRID_TOLERANCE) return false;
  const k = Math.round((value - from) / pitch);
  return Math.abs(from + k * pitch - value) <= GRID_TOLERANCE;
}

/**
 * Snaps a point to the nearest system hole: the nearest hole on the front or rear row. Returns null
 * when the panel is too small to carry a row.
 */
export function snapToSystemHole(grid: SystemGrid, point: Point): Point | null {
  if (grid.rows.length === 0 || grid.lastY < grid.firstY) return null;
  const x = grid.rows.reduce((best, row) => (Math.abs(row - point.x) < Math.abs(best - point.x) ? row : best));
  return { x, y: nearestStep(point.y, grid.firstY, grid.pitch, Math.round((grid.lastY - grid.firstY) / grid.pitch)) };
}

/**
 * The nearest point of the 32 mm grid: any column a whole number of pitches behind the front row
 * (where runners and lift mechanisms screw in), at any hole height. Null when nothing fits.
 */
export function nearestGridPoint(grid: SystemGrid, point: Point): Point | null {
  if (grid.lastX < grid.setback || grid.lastY < grid.firstY) return null;
  return {
    x: nearestStep(point.x, grid.setback, grid.pitch, Math.round((grid.lastX - grid.setback) / grid.pitch)),
    y: nearestStep(point.y, grid.firstY, grid.pitch, Math.round((grid.lastY - grid.firstY) / grid.pitch)),
  };
}

/** Whether an x lies on a column of the 32 mm grid: a whole number of pitches behind the front row (within 0.01 mm). */
export function isOnGridColumn(grid: SystemGrid, x: number): boolean {
  return onStep(x, grid.setback, grid.pitch, grid.lastX);
}

/** Whether a y lies at a hole height of the 32 mm grid (within 0.01 mm). */
export function isOnGridHeight(grid: SystemGrid, y: number): boolean {
  return onStep(y, grid.firstY, grid.pitch, grid.lastY);
}

/** Whether a point lies on the 32 mm grid of the panel (within 0.01 mm). */
export function isOnGrid(grid: SystemGrid, point: Point): boolean {
  return isOnGridColumn(grid, point.x) && isOnGridHeight(grid, point.y);
}
