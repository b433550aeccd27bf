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

/**
 * The distance from a face circle to each edge of the panel (negative when it crosses it), closest first;
 * ties go to the edge listed first, so the answer does not depend on anything but the numbers.
 */
export function edgeDistances(
  circle: { x: number; y: number; diameter: number },
  panel: { width: number; height: number },
): { edge: Edge; distance: number }[] {
  const r = circle.diameter / 2;
  const all: { edge: Edge; distance: number }[] = [
    { edge: 'x0', distance: circle.x - r },
    { edge: 'x1', distance: panel.width - circle.x - r },
    { edge: 'y0', distance: circle.y - r },
    { edge: 'y1', distance: panel.height - circle.y - r },
  ];
  return all.sort((a, b) => a.distance - b.distance);
}
