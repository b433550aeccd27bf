import { copyPlacements } from '../../../../../shared/layout/copy-placements';
import type { Bore, Panel, Placement } from '../../../../../shared/model/job-document';
import { freeId } from '../free-id';
import { moveBore } from './move-items';

/** What Ctrl+C keeps: copies of placements and loose bores, as plain data. */
export interface Clipboard {
  placements: readonly Placement[];
  bores: readonly Bore[];
}

export interface PasteParams {
  clipboard: Clipboard;
  offset: { x: number; y: number };
}

/**
 * Adds the clipboard's items moved by the offset. Placements keep their ids where free (shared
 * copyPlacements); loose bores likewise, else the first free `${id}-2` ….
 */
export function pasteItems(panel: Panel, { clipboard, offset }: PasteParams): Panel {
  const withPlacements = copyPlacements(clipboard.placements, panel, offset);
  const taken = new Set(panel.bores.map((b) => b.id));
  const bores = clipboard.bores.map((b) => {
    const id = freeId(b.id, taken);
    taken.add(id);
    return { ...moveBore(b, offset.x, offset.y), id };
  });
  return { ...withPlacements, bores: [...panel.bores, ...bores] };
}
