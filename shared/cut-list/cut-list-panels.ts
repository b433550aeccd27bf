import type { PanelRole } from '../model/job-document';
import type { CutListRow } from './parse-cut-list';

/** A panel a cut list creates: board data only, in no carcass, with nothing drilled yet. */
export interface CutListPanel {
  name: string;
  role: PanelRole;
  width: number;
  height: number;
  thickness: number;
  material: string;
}

/**
 * The panels of importable rows, in file order: a row of quantity 1 gives one panel with the row's
 * name; quantity 3 of "Shelf" gives "Shelf 1", "Shelf 2", "Shelf 3", so that each label and drilling
 * map names one board the bench can find.
 */
export function cutListPanels(rows: readonly CutListRow[]): CutListPanel[] {
  return rows.flatMap((row) => {
    const { name, role, width, height, thickness, material, quantity } = row;
    if (row.errors.length > 0 || width === null || height === null || thickness === null || material === null || quantity === null) {
      throw new Error(`Row ${row.row} has errors and cannot become panels.`);
    }
    return Array.from({ length: quantity }, (_, i) => ({ name: quantity === 1 ? name : `${name} ${i + 1}`, role, width, height, thickness, material }));
  });
}
