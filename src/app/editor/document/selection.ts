/** What is selected on a panel: placements and loose bores by id (the two lists may share an id). */
export interface Selection {
  readonly placements: ReadonlySet<string>;
  readonly bores: ReadonlySet<string>;
}

export const NO_SELECTION: Selection = { placements: new Set(), bores: new Set() };

export function selectionOf(placements: Iterable<string>, bores: Iterable<string> = []): Selection {
  return { placements: new Set(placements), bores: new Set(bores) };
}

export function isEmptySelection(selection: Selection): boolean {
  return selection.placements.size === 0 && selection.bores.size === 0;
}

/** Items selected by one, added to the other: a shift-click or a box with Shift held. */
export function unionSelection(a: Selection, b: Selection): Selection {
  return selectionOf([...a.placements, ...b.placements], [...a.bores, ...b.bores]);
}
