import type { Panel } from '../../../../../shared/model/job-document';
import type { Selection } from '../selection';

/** Removes the selected placements and loose bores. */
export function deleteItems(panel: Panel, { selection }: { selection: Selection }): Panel {
  return {
    ...panel,
    placements: panel.placements.filter((p) => !selection.placements.has(p.id)),
    bores: panel.bores.filter((b) => !selection.bores.has(b.id)),
  };
}
