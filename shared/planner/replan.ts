import { panel as panelSchema, type Panel, type PanelStatus } from '../model/job-document';

/** A panel of the carcass as it is stored now, with what says whether someone worked on it since it was planned. */
export interface StoredPanel {
  panel: Panel;
  /** 1 when the panel is as the planner stored it; every save, rename or status mark raises it. */
  version: number;
  status: PanelStatus;
}

/** What to do with panels changed by hand since the carcass was planned. */
export type ChangedPanelChoice = 'keep' | 'replace';

/** A panel changed by hand whose content the new plan would not give back. */
export interface ChangedPanel {
  id: string;
  name: string;
  status: PanelStatus;
  /** The new plan has no panel of this id: replacing removes it. */
  dropped: boolean;
}

export interface Replacement {
  /** Panels to write over with the plan's (same id, so links and history stay). */
  update: Panel[];
  /** The plan's panels the carcass does not have yet. */
  insert: Panel[];
  /** Stored panels to delete: the plan has none of their id. */
  remove: string[];
  /** Changed panels left as they are. */
  keep: string[];
}

/** The document's view of a panel, so that a stored panel and a planned one compare field by field. */
function fingerprint(p: Panel): string {
  const { status: _status, ...content } = panelSchema.parse(p);
  return JSON.stringify(content, (_key, value: unknown) => (value === null ? undefined : value));
}

/**
 * The panels that re-planning would lose work on: those saved or marked since they were planned
 * (version above 1, or a status other than planned) whose content differs from what the new plan
 * gives for them. A panel saved without a change, or changed into exactly what the plan now gives,
 * loses nothing and is not asked about (writing the plan over it keeps its status).
 */
export function changedSincePlanned(stored: readonly StoredPanel[], planned: readonly Panel[]): ChangedPanel[] {
  const plannedById = new Map(planned.map((p) => [p.id, p]));
  return stored.flatMap((s) => {
    if (s.version <= 1 && s.status === 'planned') return [];
    const next = plannedById.get(s.panel.id);
    if (next && fingerprint(next) === fingerprint(s.panel)) return [];
    return [{ id: s.panel.id, name: s.panel.name, status: s.status, dropped: next === undefined }];
  });
}

/**
 * How a new plan replaces the carcass's stored panels. `keep` leaves every changed panel exactly as
 * it is (the checks then say whether it still fits the others, such as a door whose hinges no longer
 * meet the new plates); `replace` writes the plan over all of them.
 */
export function replacement(stored: readonly StoredPanel[], planned: readonly Panel[], choice: ChangedPanelChoice): Replacement {
  const kept = new Set(choice === 'keep' ? changedSincePlanned(stored, planned).map((c) => c.id) : []);
  const storedIds = new Set(stored.map((s) => s.panel.id));
  const plannedIds = new Set(planned.map((p) => p.id));
  return {
    update: planned.filter((p) => storedIds.has(p.id) && !kept.has(p.id)),
    insert: planned.filter((p) => !storedIds.has(p.id)),
    remove: stored.map((s) => s.panel.id).filter((id) => !plannedIds.has(id) && !kept.has(id)),
    keep: [...kept],
  };
}
