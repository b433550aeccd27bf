import type { Fitting } from '../../../../shared/catalog/fitting';
import { nearestGridPoint, snapToSystemHole, type Point } from '../../../../shared/grid/snap';
import { systemGrid, type SystemGrid } from '../../../../shared/grid/system-grid';
import { orientOffset, type Orientation } from '../../../../shared/layout/orientation';
import type { JobDocument, Panel } from '../../../../shared/model/job-document';
import { roundMm } from './commands/move-items';

export interface SnapRule {
  grid: SystemGrid;
  /** The step for fittings off the rows, mm (1 by default, or the user's). */
  step: number;
  /** Alt held: no snapping at all. */
  free: boolean;
}

/** The panel's 32 mm grid, its rows starting at half the board that adjoins it (the carcass's material). */
export function panelGrid(job: JobDocument, panel: Panel): SystemGrid {
  const carcass = job.carcasses.find((c) => c.id === panel.carcass);
  const board = job.materials.find((m) => m.id === carcass?.material)?.thickness ?? panel.thickness;
  return systemGrid(panel, board, job.system);
}

function toStep(value: number, step: number): number {
  return roundMm(Math.round(value / step) * step);
}

/**
 * Where a placement lands for a pointer at `point`. A fitting made for the system rows puts its first
 * face bore on a system hole (a runner or lift mechanism on any grid column, as they screw in between
 * the rows); any other fitting, or one on a panel too small for a row, goes to the step.
 */
export function snapPlacement(point: Point, orientation: Orientation, fitting: Fitting | undefined, rule: SnapRule): Point {
  if (rule.free) return { x: roundMm(point.x), y: roundMm(point.y) };
  const anchorBore = fitting?.onSystemRow ? fitting.bores.find((b) => b.kind === 'face') : undefined;
  if (fitting && anchorBore) {
    const [dx, dy] = orientOffset(anchorBore.x, anchorBore.y, orientation);
    const hole = { x: point.x + dx, y: point.y + dy };
    const between = fitting.purpose === 'runner' || fitting.purpose === 'lift-mechanism';
    const target = between ? nearestGridPoint(rule.grid, hole) : snapToSystemHole(rule.grid, hole);
    if (target) return { x: roundMm(target.x - dx), y: roundMm(target.y - dy) };
  }
  return { x: toStep(point.x, rule.step), y: toStep(point.y, rule.step) };
}
