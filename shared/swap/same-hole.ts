import type { PanelBore } from '../layout/bore';

/**
 * How far apart two centres may be and still be one hole (mm): a drilled hole is only as true as the
 * machine that drilled it, and a screw or dowel finds its way into a hole 0.2 mm off (issue 7).
 */
export const SAME_HOLE_TOLERANCE = 0.2;

/**
 * Whether a hole the new fitting needs is where an existing hole is: the same face (or the same edge at
 * the same height from face A), the centre within 0.2 mm, the same diameter. Depth is asked separately,
 * since a hole too shallow can be drilled deeper.
 */
export function isSameHoleWithin(existing: PanelBore, wanted: PanelBore): boolean {
  if (existing.diameter !== wanted.diameter) return false;
  if (existing.kind === 'face' && wanted.kind === 'face') {
    return existing.face === wanted.face && Math.hypot(existing.x - wanted.x, existing.y - wanted.y) <= SAME_HOLE_TOLERANCE;
  }
  if (existing.kind === 'edge' && wanted.kind === 'edge') {
    return existing.edge === wanted.edge && Math.hypot(existing.at - wanted.at, existing.z - wanted.z) <= SAME_HOLE_TOLERANCE;
  }
  return false;
}

/** Whether an existing hole is deep enough for the one wanted there (a deeper hole takes a shorter screw). */
export function isDeepEnough(existing: PanelBore, wanted: PanelBore): boolean {
  return existing.depth + SAME_HOLE_TOLERANCE >= wanted.depth;
}
