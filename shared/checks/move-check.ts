import type { Catalog } from '../catalog/fitting';
import { planBox, type Box } from '../layout/bore';
import { layoutPanel } from '../layout/panel-layout';
import { isEdgeBore, type JobDocument, type Panel } from '../model/job-document';
import { compareFindings, type Finding } from './finding';
import { checkPanel, type CheckOptions } from './index';

/**
 * How far (mm) from a moved item another hole can still share a finding with it: well past the widest
 * cup (35 mm), the web the shop asks between holes and an edge bore's depth into the board, so that a
 * hole farther off cannot overlap, crowd or clash with anything that moved.
 */
export const MOVE_REACH = 100;

/** What a move changes: placements and loose bores by id. */
export interface MovedItems {
  placements: ReadonlySet<string>;
  bores: ReadonlySet<string>;
}

function grow([x0, y0, x1, y1]: Box, by: number): Box {
  return [x0 - by, y0 - by, x1 + by, y1 + by];
}

function overlaps(a: Box, b: Box): boolean {
  return a[0] <= b[2] && b[0] <= a[2] && a[1] <= b[3] && b[1] <= a[3];
}

/**
 * The findings of a panel while some of its items move (a drag), from the findings of the same panel
 * before they moved, as `checkPanel` without fixes would give them. A finding that concerns no moved
 * item stands as it was; those that may concern one (and those about the panel as a whole) are found
 * again on the panel with all its placements and edge bores but only the face bores within
 * `MOVE_REACH` of what moved, so that a move costs the checks of its neighbourhood, not of every hole.
 * A full `checkPanel` when the move ends gives the same findings (move-check.spec.ts).
 */
export function checkMove(job: JobDocument, catalog: Catalog, before: readonly Finding[], panel: Panel, moved: MovedItems, options: Pick<CheckOptions, 'unit'> = {}): Finding[] {
  const movers = layoutPanel(
    { ...panel, placements: panel.placements.filter((p) => moved.placements.has(p.id)), bores: panel.bores.filter((b) => moved.bores.has(b.id)) },
    catalog,
    job.system,
  );
  const boxes = [...movers.bores.map((b) => planBox(b, panel)), ...movers.placed.flatMap((p) => p.keepOuts.map((k) => k.box))].map((b) => grow(b, MOVE_REACH));
  const near = panel.bores.filter((b) => moved.bores.has(b.id) || isEdgeBore(b) || boxes.some((box) => overlaps(box, [b.x - b.diameter / 2, b.y - b.diameter / 2, b.x + b.diameter / 2, b.y + b.diameter / 2])));
  const movedBores = new Set([...moved.bores, ...movers.bores.map((b) => b.id)]);
  const concernsMoved = (f: Finding) => f.placements.some((id) => moved.placements.has(id)) || f.bores.some((id) => movedBores.has(id));
  const wholePanel = (f: Finding) => f.placements.length === 0 && f.bores.length === 0;
  const again = checkPanel(job, { ...panel, bores: near }, catalog, { fixes: false, unit: options.unit }).filter((f) => concernsMoved(f) || wholePanel(f));
  return [...before.filter((f) => !concernsMoved(f) && !wholePanel(f)), ...again].sort(compareFindings);
}
