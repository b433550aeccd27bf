import type { Edge, Face, Rotation } from '../model/job-document';

/** How a placement lays its fitting on the panel. */
export interface Orientation {
  rotation: Rotation;
  mirrored?: boolean;
  face: Face;
}

/**
 * Maps an offset drawn in the fitting's frame to the panel's frame seen on face A. The fitting is first
 * mirrored (x → −x) if asked, then turned counter-clockwise by its rotation as seen from the face it sits
 * on; on face B the result is mirrored in x, because face B seen from face A is its mirror image.
 * Quarter turns only, so the arithmetic is exact.
 */
export function orientOffset(dx: number, dy: number, o: Orientation): [number, number] {
  const x = o.mirrored ? -dx : dx;
  let turned: [number, number];
  switch (o.rotation) {
    case 0:
      turned = [x, dy];
      break;
    case 90:
      turned = [-dy, x];
      break;
    case 180:
      turned = [-x, -dy];
      break;
    case 270:
      turned = [dy, -x];
      break;
  }
  // `+ 0` turns −0 into 0 so that equal layouts compare equal.
  return [(o.face === 'B' ? -turned[0] : turned[0]) + 0, turned[1] + 0];
}

const DIRECTION: Record<Edge, [number, number]> = { x0: [-1, 0], x1: [1, 0], y0: [0, -1], y1: [0, 1] };

/** The panel edge that an edge named in the fitting's frame lands on. */
export function orientEdge(edge: Edge, o: Orientation): Edge {
  const [dx, dy] = orientOffset(...DIRECTION[edge], o);
  if (dx !== 0) return dx < 0 ? 'x0' : 'x1';
  return dy < 0 ? 'y0' : 'y1';
}
