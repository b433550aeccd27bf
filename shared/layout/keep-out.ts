import type { Fitting } from '../catalog/fitting';
import type { Face, Placement } from '../model/job-document';
import type { Box } from './bore';
import { orientOffset } from './orientation';

/** A keep-out laid on a panel: the face area a placed fitting's body needs. */
export interface PanelKeepOut {
  placement: string;
  face: Face;
  box: Box;
}

/** The keep-outs of a placed fitting, in the panel's frame seen on face A. */
export function placeKeepOuts(placement: Placement, fitting: Fitting): PanelKeepOut[] {
  return fitting.keepOuts.map((k) => {
    // Quarter turns keep rectangles axis-aligned: two opposite corners give the whole of it.
    const [ax, ay] = orientOffset(k.x, k.y, placement);
    const [bx, by] = orientOffset(k.x + k.width, k.y + k.height, placement);
    return {
      placement: placement.id,
      face: placement.face,
      box: [placement.x + Math.min(ax, bx), placement.y + Math.min(ay, by), placement.x + Math.max(ax, bx), placement.y + Math.max(ay, by)],
    };
  });
}
