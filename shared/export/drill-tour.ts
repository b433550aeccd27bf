/** A point of a drilling program's plane, mm. */
export interface TourPoint {
  u: number;
  v: number;
}

const distance = (a: TourPoint, b: TourPoint) => Math.hypot(a.u - b.u, a.v - b.v);

/**
 * The points in nearest-neighbour order from `start`: each next point the closest not yet visited, ties to
 * the one listed first. Not the shortest tour, but never far from it on a panel's rows of holes, and
 * quadratic in the points of one tool (a few hundred at most on a panel).
 */
export function nearestNeighbourTour<T extends TourPoint>(points: readonly T[], start: TourPoint): T[] {
  const left = [...points];
  const tour: T[] = [];
  let at: TourPoint = start;
  while (left.length > 0) {
    let best = 0;
    let bestDistance = distance(at, left[0]);
    for (let i = 1; i < left.length; i++) {
      const d = distance(at, left[i]);
      if (d < bestDistance) [best, bestDistance] = [i, d];
    }
    const [next] = left.splice(best, 1);
    tour.push(next);
    at = next;
  }
  return tour;
}

/** The length of the path from `start` through the points in their order, mm. */
export function tourLength(points: readonly TourPoint[], start: TourPoint): number {
  let length = 0;
  let at = start;
  for (const point of points) {
    length += distance(at, point);
    at = point;
  }
  return length;
}
