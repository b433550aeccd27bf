/** A point in the panel's frame (mm) or on the screen (CSS px). */
export interface Point {
  x: number;
  y: number;
}

/**
 * How the panel lies on the screen: `scale` px per mm, the screen position of the panel's origin, and
 * whether it is seen from face B, which shows the panel mirrored in x. y runs up on the panel and down
 * on the screen.
 */
export interface View {
  scale: number;
  x: number;
  y: number;
  fromB: boolean;
}

export const MIN_SCALE = 0.05;
export const MAX_SCALE = 40;

export function toScreen(view: View, p: Point): Point {
  return { x: view.x + (view.fromB ? -p.x : p.x) * view.scale, y: view.y - p.y * view.scale };
}

export function toPanel(view: View, s: Point): Point {
  const x = (s.x - view.x) / view.scale;
  return { x: view.fromB ? -x : x, y: (view.y - s.y) / view.scale };
}

/** The whole panel in the middle of the stage with a margin for the edge marks and dimensions. */
export function fitView(panel: { width: number; height: number }, stage: { width: number; height: number }, fromB: boolean, margin = 48): View {
  const scale = Math.min(Math.max((stage.width - 2 * margin) / panel.width, MIN_SCALE), Math.max((stage.height - 2 * margin) / panel.height, MIN_SCALE));
  const left = (stage.width - panel.width * scale) / 2;
  const bottom = (stage.height + panel.height * scale) / 2;
  return { scale, x: fromB ? left + panel.width * scale : left, y: bottom, fromB };
}

/** Zooms by `factor` keeping the panel point under `at` (a screen point) where it is. */
export function zoomAt(view: View, at: Point, factor: number): View {
  const scale = Math.min(Math.max(view.scale * factor, MIN_SCALE), MAX_SCALE);
  const k = scale / view.scale;
  return { ...view, scale, x: at.x - (at.x - view.x) * k, y: at.y - (at.y - view.y) * k };
}

/**
 * Two fingers on a touch screen: the panel follows their midpoint and zooms by the change of their
 * distance, so the panel point first under the midpoint stays under it.
 */
export function pinchView(start: View, from: readonly [Point, Point], to: readonly [Point, Point]): View {
  const mid = ([a, b]: readonly [Point, Point]) => ({ x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 });
  const apart = ([a, b]: readonly [Point, Point]) => Math.hypot(a.x - b.x, a.y - b.y);
  const m0 = mid(from);
  const m1 = mid(to);
  const moved = { ...start, x: start.x + m1.x - m0.x, y: start.y + m1.y - m0.y };
  return zoomAt(moved, m1, apart(to) / Math.max(apart(from), 1));
}

/** A view that shows the box [minX, minY, maxX, maxY] (mm) large in the middle, for a finding's bores. */
export function viewOfBox(box: readonly number[], stage: { width: number; height: number }, fromB: boolean): View {
  const [minX, minY, maxX, maxY] = box;
  const pad = 40;
  const fitted = fitView({ width: Math.max(maxX - minX + pad, 1), height: Math.max(maxY - minY + pad, 1) }, stage, fromB);
  const scale = Math.min(fitted.scale, 6);
  const centre = { x: (minX + maxX) / 2, y: (minY + maxY) / 2 };
  return { scale, fromB, x: stage.width / 2 - (fromB ? -centre.x : centre.x) * scale, y: stage.height / 2 + centre.y * scale };
}
