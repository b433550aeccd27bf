import type { Edge } from '../model/job-document';

/** What a bench hand calls each edge of a panel in its frame. */
export const EDGE_NAME: Record<Edge, string> = {
  x0: 'the reference edge',
  x1: 'the far edge',
  y0: 'the lower edge',
  y1: 'the upper edge',
};

/** The direction that points away from each edge into the panel. */
export const INWARD: Record<Edge, [number, number]> = { x0: [1, 0], x1: [-1, 0], y0: [0, 1], y1: [0, -1] };

/** The distance from a face circle to the nearest edge of the panel (negative when it crosses one). */
export function edgeClearance(circle: { x: number; y: number; diameter: number }, panel: { width: number; height: number }): number {
  const r = circle.diameter / 2;
  return Math.min(circle.x - r, panel.width - circle.x - r, circle.y - r, panel.height - circle.y - r);
}

/**
 * The edge nearest to a face circle and the distance from the circle to it (negative when it crosses it).
 * Ties go to x0, x1, y0, y1 in that order, so the answer depends on the numbers alone.
 */
export function nearestEdge(
  circle: { x: number; y: number; diameter: number },
  panel: { width: number; height: number },
): { edge: Edge; distance: number } {
  const r = circle.diameter / 2;
  const x0 = circle.x - r;
  const x1 = panel.width - circle.x - r;
  const y0 = circle.y - r;
  const y1 = panel.height - circle.y - r;
  const distance = Math.min(x0, x1, y0, y1);
  const edge: Edge = distance === x0 ? 'x0' : distance === x1 ? 'x1' : distance === y0 ? 'y0' : 'y1';
  return { edge, distance };
}
