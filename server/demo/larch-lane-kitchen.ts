import { DEFAULT_MATERIALS } from '../../shared/model/default-materials';
import { JOB_FORMAT, type JobDocumentInput } from '../../shared/model/job-document';
import { box, DEMO_SYSTEM, front, sides, topAndBottom } from './carcass-parts';
import { defaultMaterial } from './demo-materials';

const carcassBoard = defaultMaterial('particleboard-18');
const frontBoard = defaultMaterial('mdf-19');

// 722 = 32 · 22 + 18: the balanced height nearest the usual 720, so the rows end 9 mm below the top as they start 9 mm above the bottom.
const base = box('base-1', 'Sink base', { width: 600, height: 722, depth: 560 }, carcassBoard);
const wall = box('wall-1', 'Wall unit', { width: 600, height: 722, depth: 320 }, carcassBoard, 'wall');

/** The Larch Lane kitchen: a sink base with a drawer and a door, and a wall unit with one door. */
export const larchLaneKitchen: JobDocumentInput = {
  format: JOB_FORMAT,
  name: 'Larch Lane kitchen',
  client: 'The Okafor family, 7 Larch Lane',
  notes: 'Base units stand on a 150 mm plinth. Doors and drawer fronts are drilled before they go out for lacquer.',
  system: DEMO_SYSTEM,
  materials: [...DEFAULT_MATERIALS],
  carcasses: [base.carcass, wall.carcass],
  panels: [
    ...sides(base),
    ...topAndBottom(base),
    // Door from 2 mm above the carcass bottom, 2 mm gap, then the drawer front up to 2 mm below the top.
    front(base, { id: 'door', name: 'Sink base, door', role: 'door', width: 596, height: 576, board: frontBoard, handleMass: 0.2, hang: { on: ['left'], dy: 2 } }),
    front(base, { id: 'drawer-front', name: 'Sink base, drawer front', role: 'drawer-front', width: 596, height: 140, board: frontBoard, handleMass: 0.2 }),
    ...sides(wall),
    ...topAndBottom(wall),
    front(wall, { id: 'door', name: 'Wall unit, door', role: 'door', width: 596, height: 718, board: frontBoard, handleMass: 0.2, hang: { on: ['left'], dy: 2 } }),
  ],
};
