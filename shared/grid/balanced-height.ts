import { GRID_TOLERANCE } from './system-grid';

/**
 * Whether a side of this height is balanced: H = pitch·n + T (n ≥ 1), so that with holes starting at
 * half the adjoining board's thickness T the last hole sits as far below the top as the first above
 * the bottom (trade-reference §1).
 */
export function isBalancedHeight(height: number, boardThickness: number, pitch = 32): boolean {
  const n = (height - boardThickness) / pitch;
  return n >= 1 - GRID_TOLERANCE && Math.abs(n - Math.round(n)) * pitch <= GRID_TOLERANCE;
}

/**
 * The balanced heights next to a given height: the highest at or below it (null when even one pitch
 * does not fit) and the lowest at or above it. A balanced height is returned as both.
 */
export function nearestBalancedHeights(
  height: number,
  boardThickness: number,
  pitch = 32,
): { below: number | null; above: number } {
  const n = (height - boardThickness) / pitch;
  const nearest = Math.round(n);
  const snapped = Math.abs(n - nearest) * pitch <= GRID_TOLERANCE ? nearest : n;
  const below = Math.floor(snapped);
  const above = Math.max(Math.ceil(snapped), 1);
  return {
    below: below >= 1 ? boardThickness + below * pitch : null,
    above: boardThickness + above * pitch,
  };
}
