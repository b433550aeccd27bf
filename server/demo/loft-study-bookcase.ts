import { DEFAULT_MATERIALS } from '../../shared/model/default-materials';
import { JOB_FORMAT, type JobDocumentInput } from '../../shared/model/job-document';
import { box, DEMO_SYSTEM, fixedShelf, front, shelves, sides, topAndBottom, type Box } from './carcass-parts';
import { defaultMaterial } from './demo-materials';

const carcassBoard = defaultMaterial('plywood-18');
const frontBoard = defaultMaterial('mdf-19');

/**
 * One wall-hung unit: open adjustable shelves below, a compartment closed by a lift-up flap above.
 * 1202 = 32 · 37 + 18, a balanced height.
 */
function unit(id: string, name: string): { b: Box; panels: NonNullable<JobDocumentInput['panels']> } {
  const b = box(id, name, { width: 600, height: 1202, depth: 300 }, carcassBoard, 'wall');
  return {
    b,
    panels: [
      ...sides(b),
      ...topAndBottom(b),
      fixedShelf(b, 'fixed-shelf', `${name}, fixed shelf under the flap`),
      ...shelves(b, 2, 10),
      // The flap closes the top compartment, hinged at the top: its x runs down from the hinge edge (side height
      // 1200) to the free edge (804), so its width is its drop. Hung on both sides, so a lift mechanism placed on
      // either side acts on it (design.md §3); dy gives where the free edge rests on the sides.
      front(b, { id: 'flap', name: `${name}, flap`, role: 'flap', width: 396, height: 596, board: frontBoard, handleMass: 0.1, hang: { on: ['left', 'right'], dy: 804 } }),
    ],
  };
}

const left = unit('left', 'Bookcase left');
const right = unit('right', 'Bookcase right');

/** A loft study's wall-hung bookcase: two units side by side, each with a lift-up flap and adjustable shelves. */
export const loftStudyBookcase: JobDocumentInput = {
  format: JOB_FORMAT,
  name: 'Loft study bookcase',
  client: 'R. Lindqvist, loft conversion',
  notes: 'Hung on a studded wall: fixings and their loads are for the fitter to choose from the fixing maker\'s data.',
  system: DEMO_SYSTEM,
  materials: [...DEFAULT_MATERIALS],
  carcasses: [left.b.carcass, right.b.carcass],
  panels: [...left.panels, ...right.panels],
};
