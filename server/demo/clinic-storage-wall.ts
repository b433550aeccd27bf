import { plannedJob } from './planned-job';

const tallUnit = (id: string, name: string, hingeSide: 'left' | 'right') =>
  ({
    id, name, width: 600, height: 2131, depth: 580, material: 'mdf-19',
    back: { type: 'inset' }, construction: 'dowels', mounting: { type: 'kickboard', height: 100, setBack: 50 },
    shelves: { type: 'adjustable', count: 5, play: 1 },
    fronts: { type: 'doors', count: 1, overlay: 'full', reveal: 3, hingeSide, handleMass: 0.3 },
  }) as const;

/**
 * A clinic's storage wall: two tall units with tall doors. 2131 = 32 · 66 + 19 is the balanced height
 * of the 32 mm literature's example (WOODWEB Knowledge Base, "Panel and Door Balancing with 32mm Systems").
 */
export const clinicStorageWall = plannedJob(
  {
    name: 'Clinic storage wall',
    client: 'Westmoor Physiotherapy Clinic',
    notes: 'Tall units: anchor each to the wall against tipping, with fixings chosen for the wall.',
  },
  [tallUnit('tall-1', 'Tall unit 1', 'left'), tallUnit('tall-2', 'Tall unit 2', 'right')],
);
