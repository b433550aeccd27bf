import { DEFAULT_MATERIALS } from '../../shared/model/default-materials';
import { JOB_FORMAT, type JobDocumentInput } from '../../shared/model/job-document';
import { box, DEMO_SYSTEM, front, shelves, sides, topAndBottom } from './carcass-parts';
import { defaultMaterial } from './demo-materials';

const board = defaultMaterial('mdf-19');

// 2131 = 32 · 66 + 19, the balanced tall side of the 32 mm literature (trade-reference §1).
const tall = (id: string, name: string) => box(id, name, { width: 600, height: 2131, depth: 560 }, board);
const first = tall('tall-1', 'Tall unit 1');
const second = tall('tall-2', 'Tall unit 2');

/** A clinic's storage wall: two tall units with full-height doors hinged on their outer sides. */
export const clinicStorageWall: JobDocumentInput = {
  format: JOB_FORMAT,
  name: 'Clinic storage wall',
  client: 'Westmoor Physiotherapy Clinic',
  notes: 'Tall units: anchor each to the wall.',
  system: DEMO_SYSTEM,
  materials: [...DEFAULT_MATERIALS],
  carcasses: [first.carcass, second.carcass],
  panels: [
    ...sides(first),
    ...topAndBottom(first),
    ...shelves(first, 3, 20),
    front(first, { id: 'door', name: 'Tall unit 1, door', role: 'door', width: 596, height: 2127, board, handleMass: 0.3, hang: { on: ['left'], dy: 2 } }),
    ...sides(second),
    ...topAndBottom(second),
    ...shelves(second, 3, 20),
    front(second, { id: 'door', name: 'Tall unit 2, door', role: 'door', width: 596, height: 2127, board, handleMass: 0.3, hang: { on: ['right'], dy: 2 } }),
  ],
};
