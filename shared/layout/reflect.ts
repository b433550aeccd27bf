import { isEdgeBore, type Bore, type Edge, type Panel, type Placement, type Rotation } from '../model/job-document';

/** The centre line to reflect across: `x` maps x to width − x, `y` maps y to height − y. */
export type ReflectAxis = 'x' | 'y';

type Size = { width: number; height: number };

const OPPOSITE: Record<Edge, Edge> = { x0: 'x1', x1: 'x0', y0: 'y1', y1: 'y0' };

/**
 * Reflects a placement across the panel's centre line. Its fitting is laid as mirror · turn · (mirror),
 * and a reflection commutes with the face's own mirror, so reflecting in x turns it by −r and toggles
 * `mirrored`; reflecting in y (a reflection in x followed by a half turn) turns it by 180° − r.
 */
export function reflectPlacement(placement: Placement, axis: ReflectAxis, panel: Size): Placement {
  const turn = axis === 'x' ? 360 - placement.rotation : 540 - placement.rotation;
  return {
    ...placement,
    x: axis === 'x' ? panel.width - placement.x : placement.x,
    y: axis === 'y' ? panel.height - placement.y : placement.y,
    rotation: (turn % 360) as Rotation,
    mirrored: !placement.mirrored,
  };
}

/** Reflects a loose bore across the panel's centre line; an edge bore moves to the opposite edge. */
export function reflectBore(bore: Bore, axis: ReflectAxis, panel: Size): Bore {
  if (!isEdgeBore(bore)) {
    return axis === 'x' ? { ...bore, x: panel.width - bore.x } : { ...bore, y: panel.height - bore.y };
  }
  const across = axis === 'x' ? bore.edge === 'x0' || bore.edge === 'x1' : bore.edge === 'y0' || bore.edge === 'y1';
  if (across) return { ...bore, edge: OPPOSITE[bore.edge] };
  return { ...bore, at: (axis === 'x' ? panel.width : panel.height) - bore.at };
}

/**
 * A panel's drilling reflected across its own centre line, within its own frame: to repeat one end's
 * drilling at the other end of a top, bottom or shelf (whose y runs along its length, design.md §3), or to
 * mirror a pattern on a door. Reflecting twice gives the drilling back.
 */
export function reflectDrilling(panel: Panel, axis: ReflectAxis): Panel {
  return {
    ...panel,
    placements: panel.placements.map((p) => reflectPlacement(p, axis, panel)),
    bores: panel.bores.map((b) => reflectBore(b, axis, panel)),
  };
}
