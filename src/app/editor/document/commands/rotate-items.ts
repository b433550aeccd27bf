import type { Panel, Rotation } from '../../../../../shared/model/job-document';
import type { Selection } from '../selection';

const NEXT: Record<Rotation, Rotation> = { 0: 90, 90: 180, 180: 270, 270: 0 };

/** Turns each selected placement a quarter turn counter-clockwise about its own anchor. Loose bores are round: they stay. */
export function rotateItems(panel: Panel, { selection }: { selection: Selection }): Panel {
  return {
    ...panel,
    placements: panel.placements.map((p) => (selection.placements.has(p.id) ? { ...p, rotation: NEXT[p.rotation] } : p)),
  };
}
