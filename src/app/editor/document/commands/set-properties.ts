import type { Panel, Placement } from '../../../../../shared/model/job-document';

/** The fields of a placement the properties form edits. */
export type PlacementChanges = Partial<Pick<Placement, 'x' | 'y' | 'face' | 'rotation' | 'params'>>;

export interface SetPropertiesParams {
  id: string;
  changes: PlacementChanges;
}

/** Changes one placement's position, face, rotation or fitting parameters. */
export function setProperties(panel: Panel, { id, changes }: SetPropertiesParams): Panel {
  return { ...panel, placements: panel.placements.map((p) => (p.id === id ? { ...p, ...changes } : p)) };
}
