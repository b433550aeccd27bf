import type { Catalog } from '../catalog/fitting';
import { planBox, type Box } from '../layout/bore';
import { expandPlacement, type PanelSize } from '../layout/expand-placement';
import { placeKeepOuts } from '../layout/keep-out';
import type { Placement, SystemSettings } from '../model/job-document';

/**
 * A test of whether a new face bore on a panel stays clear of what is already placed there: of every
 * fitting's body (its keep-outs), of every face bore by at least the minimum web, and of the path of
 * every edge bore by as much. Built once per panel.
 */
export function clearOfBodies(
  placements: readonly Placement[],
  catalog: Catalog,
  panel: PanelSize,
  system: SystemSettings,
  minWeb: number,
): (hole: { x: number; y: number; diameter: number }) => boolean {
  const boxes: Box[] = [];
  const circles: { x: number; y: number; r: number }[] = [];
  for (const placement of placements) {
    const fitting = catalog.get(placement.fitting);
    if (!fitting) continue;
    boxes.push(...placeKeepOuts(placement, fitting).map((k) => k.box));
    for (const bore of expandPlacement(placement, fitting, panel, system)) {
      if (bore.kind === 'face') circles.push({ x: bore.x, y: bore.y, r: bore.diameter / 2 });
      else {
        const [x0, y0, x1, y1] = planBox(bore, panel);
        boxes.push([x0 - minWeb, y0 - minWeb, x1 + minWeb, y1 + minWeb]);
      }
    }
  }
  return ({ x, y, diameter }) => {
    const r = diameter / 2;
    const inBody = boxes.some(([x0, y0, x1, y1]) => x + r > x0 && x - r < x1 && y + r > y0 && y - r < y1);
    return !inBody && circles.every((c) => Math.hypot(c.x - x, c.y - y) >= c.r + r + minWeb);
  };
}
