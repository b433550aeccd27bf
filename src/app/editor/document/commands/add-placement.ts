import type { Face, Panel, Placement } from '../../../../../shared/model/job-document';
import { freeId } from '../free-id';

export interface AddParams {
  fitting: string;
  x: number;
  y: number;
  face: Face;
}

/** The id a new placement of this fitting gets: the fitting's id numbered, `plate-0-1`, `plate-0-2` …. */
export function newPlacementId(panel: Panel, fitting: string): string {
  return freeId(fitting, new Set(panel.placements.map((p) => p.id)), true);
}

/** Places a fitting at (x, y) on a face, unturned and unmirrored. */
export function addPlacement(panel: Panel, { fitting, x, y, face }: AddParams): Panel {
  const placement: Placement = { id: newPlacementId(panel, fitting), fitting, x, y, face, rotation: 0 };
  return { ...panel, placements: [...panel.placements, placement] };
}
