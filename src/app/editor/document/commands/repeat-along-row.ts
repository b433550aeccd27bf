import { copyPlacements } from '../../../../../shared/layout/copy-placements';
import type { Panel } from '../../../../../shared/model/job-document';
import type { Selection } from '../selection';

export interface RepeatParams {
  selection: Selection;
  /** How many copies, each one `step` further up the row than the last. */
  count: number;
  /** The rise between copies: one pitch (32 mm) or a multiple; negative runs down the row. */
  step: number;
}

/** Repeats the selected placements along the system row: copy k sits k·step above its original. */
export function repeatAlongRow(panel: Panel, { selection, count, step }: RepeatParams): Panel {
  const originals = panel.placements.filter((p) => selection.placements.has(p.id));
  let next = panel;
  for (let k = 1; k <= count; k++) next = copyPlacements(originals, next, { x: 0, y: k * step });
  return next;
}
