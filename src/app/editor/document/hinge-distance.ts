import type { Catalog, Fitting } from '../../../../shared/catalog/fitting';
import { cupCentreFromEdge } from '../../../../shared/compute/hinge-geometry';
import type { Panel, Placement } from '../../../../shared/model/job-document';
import { formatLength } from '../../../../shared/units/format-length';
import type { LengthUnit } from '../../../../shared/units/length-unit';
import { roundMm } from './commands/move-items';

type HingeFitting = Extract<Fitting, { purpose: 'hinge-cup' }>;

function cupDiameter(fitting: HingeFitting): number {
  return fitting.bores.find((b) => b.id === fitting.hinge.cupBore)?.diameter ?? 35;
}

/** Whether x of this placement is a cup centre's distance from the hinge edge: a hinge cup, unturned. */
function measuresFromHingeEdge(placement: Pick<Placement, 'rotation'>, fitting: Fitting | undefined): fitting is HingeFitting {
  return fitting?.purpose === 'hinge-cup' && (placement.rotation ?? 0) === 0;
}

/** The cup-boring distance B of a hinge cup centred at x: x less half the cup (shared/compute/hinge-geometry). */
export function boringDistanceAt(x: number, fitting: HingeFitting): number {
  return roundMm(x - cupCentreFromEdge(0, cupDiameter(fitting)));
}

/**
 * Where a hinge cup lands across the door: the nearest x whose cup-boring distance the hinge allows, and
 * why, in words the properties form shows. Anything else keeps its x.
 */
export function hingeCupX(x: number, placement: Pick<Placement, 'rotation'>, fitting: Fitting | undefined): { x: number; why?: string } {
  if (!measuresFromHingeEdge(placement, fitting)) return { x };
  const { min, max } = fitting.hinge.boringDistance;
  const half = cupCentreFromEdge(0, cupDiameter(fitting));
  const b = Math.min(max, Math.max(min, x - half));
  return { x: roundMm(b + half), why: hingeWhy(b, half, min, max) };
}

/** The words, lengths in the member's unit; the cup's diameter is the bit's, in mm. */
function hingeWhy(b: number, half: number, min: number, max: number, unit: LengthUnit = 'mm'): string {
  const length = (mm: number) => (unit === 'mm' ? `${roundMm(mm)} mm` : formatLength(mm, unit));
  const range = unit === 'mm' ? `${min} to ${max} mm` : `${length(min)} to ${length(max)}`;
  return `Cup centre ${length(b + half)} from the hinge edge: cup-boring distance ${length(b)} plus half the Ø${roundMm(2 * half)} cup; this hinge takes ${range}.`;
}

/** The words for a hinge cup as it stands, in the member's unit, or undefined for any other placement. */
export function hingeCupWhy(placement: Placement, fitting: Fitting | undefined, unit: LengthUnit = 'mm'): string | undefined {
  if (!measuresFromHingeEdge(placement, fitting)) return undefined;
  const { min, max } = fitting.hinge.boringDistance;
  const half = cupCentreFromEdge(0, cupDiameter(fitting));
  return hingeWhy(placement.x - half, half, min, max, unit);
}

/**
 * Keeps every unturned hinge cup's `boringDistance` the one its x gives: x and B are one number seen two
 * ways, so a cup placed, dragged or typed at a new x says its B, and the planner's cups stay as planned.
 */
export function syncBoringDistances(panel: Panel, catalog: Catalog): Panel {
  let changed = false;
  const placements = panel.placements.map((p) => {
    const fitting = catalog.get(p.fitting);
    if (!measuresFromHingeEdge(p, fitting)) return p;
    const b = boringDistanceAt(p.x, fitting);
    if (p.params?.['boringDistance'] === b) return p;
    changed = true;
    return { ...p, params: { ...p.params, boringDistance: b } };
  });
  return changed ? { ...panel, placements } : panel;
}

/** The x of a hinge cup whose cup-boring distance is typed as B; undefined for anything else. */
export function cupXForBoringDistance(b: number, placement: Pick<Placement, 'rotation'>, fitting: Fitting | undefined): number | undefined {
  return measuresFromHingeEdge(placement, fitting) ? roundMm(cupCentreFromEdge(b, cupDiameter(fitting))) : undefined;
}
