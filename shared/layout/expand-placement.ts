import type { Fitting, FittingBore } from '../catalog/fitting';
import type { Placement, SystemSettings } from '../model/job-document';
import type { PanelBore } from './bore';
import { orientEdge, orientOffset } from './orientation';

export interface PanelSize {
  width: number;
  height: number;
  thickness: number;
}

/** The id of a bore expanded from a placement: stable as long as the placement and fitting keep theirs. */
export function expandedBoreId(placementId: string, fittingBoreId: string): string {
  return `${placementId}/${fittingBoreId}`;
}

function expandBore(bore: FittingBore, placement: Placement, fitting: Fitting, panel: PanelSize, system: SystemSettings): PanelBore {
  const [dx, dy] = orientOffset(bore.x, bore.y, placement);
  const x = placement.x + dx;
  const y = placement.y + dy;
  const id = expandedBoreId(placement.id, bore.id);
  const { purpose } = fitting;
  if (bore.kind === 'face') {
    const depth = bore.depth === 'through' ? panel.thickness : bore.depth === 'system' ? system.holeDepth : bore.depth;
    const through = bore.depth === 'through';
    return { kind: 'face', id, x, y, face: placement.face, diameter: bore.diameter, depth, purpose, through, placement: placement.id };
  }
  const fromFace = bore.z === 'mid' ? panel.thickness / 2 : bore.z;
  const z = placement.face === 'A' ? fromFace : panel.thickness - fromFace;
  const edge = orientEdge(bore.toward, placement);
  // The bore runs from its edge to its inner end at (x, y).
  const at = edge === 'x0' || edge === 'x1' ? y : x;
  const depth = edge === 'x0' ? x : edge === 'x1' ? panel.width - x : edge === 'y0' ? y : panel.height - y;
  return { kind: 'edge', id, edge, at, z, diameter: bore.diameter, depth, purpose, placement: placement.id };
}

/**
 * The bores a placement drills: the fitting's bores turned, mirrored and moved to the placement, with
 * ids `${placement.id}/${fitting bore id}`. A placement on face B lands mirrored in x as seen from face A.
 */
export function expandPlacement(
  placement: Placement,
  fitting: Fitting,
  panel: PanelSize,
  system: SystemSettings,
): PanelBore[] {
  return fitting.bores.map((b) => expandBore(b, placement, fitting, panel, system));
}
