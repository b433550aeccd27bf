import { isEdgeBore, type Bore, type Panel } from '../../../../../shared/model/job-document';
import type { Selection } from '../selection';

export interface MoveParams {
  selection: Selection;
  dx: number;
  dy: number;
}

/** Rounds away floating-point noise (0.1 + 0.2) so typed and dragged positions read back as typed. */
export function roundMm(value: number): number {
  return Math.round(value * 1000) / 1000;
}

/** Moves one loose bore; an edge bore only along its edge. */
export function moveBore(bore: Bore, dx: number, dy: number): Bore {
  if (!isEdgeBore(bore)) return { ...bore, x: roundMm(bore.x + dx), y: roundMm(bore.y + dy) };
  // An edge bore can only slide along its edge.
  const along = bore.edge === 'x0' || bore.edge === 'x1' ? dy : dx;
  return { ...bore, at: roundMm(bore.at + along) };
}

/**
 * Moves the selected placements and loose bores by (dx, dy) in the panel's frame. The loose bores stay
 * the same array when none of them moves, so that the stage sees at once that the panel's holes did not.
 */
export function moveItems(panel: Panel, { selection, dx, dy }: MoveParams): Panel {
  return {
    ...panel,
    placements: panel.placements.map((p) =>
      selection.placements.has(p.id) ? { ...p, x: roundMm(p.x + dx), y: roundMm(p.y + dy) } : p,
    ),
    bores: selection.bores.size === 0 ? panel.bores : panel.bores.map((b) => (selection.bores.has(b.id) ? moveBore(b, dx, dy) : b)),
  };
}
