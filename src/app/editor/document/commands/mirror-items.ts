import type { Panel } from '../../../../../shared/model/job-document';
import type { Selection } from '../selection';

/** Mirrors each selected placement about its anchor (its fitting's x → −x); twice gives it back. */
export function mirrorItems(panel: Panel, { selection }: { selection: Selection }): Panel {
  return {
    ...panel,
    placements: panel.placements.map((p) => {
      if (!selection.placements.has(p.id)) return p;
      const { mirrored: _was, ...rest } = p;
      return p.mirrored ? rest : { ...rest, mirrored: true };
    }),
  };
}
