import { plannedJob } from './planned-job';

const flapUnit = (id: string, name: string) =>
  ({
    id, name, width: 700, height: 403, depth: 350, material: 'mdf-19',
    back: { type: 'inset' }, construction: 'cams', mounting: { type: 'wall' },
    shelves: { type: 'adjustable', count: 1, play: 1 },
    fronts: { type: 'flap', reveal: 3, mechanisms: 2, handleMass: 0.2 },
  }) as const;

/**
 * A loft study's wall-hung bookcase: two flap units side by side beside an open unit of adjustable
 * shelves, and a hutch over the desk with two doors below a lift-up flap in one carcass, divided by a
 * fixed shelf. 403 = 32 · 12 + 19 and 1011 = 32 · 31 + 19 are balanced heights for 19 mm board,
 * 1202 = 32 · 37 + 18 for 18 mm.
 */
export const loftStudyBookcase = plannedJob(
  {
    name: 'Loft study bookcase',
    client: 'R. Lindqvist, loft conversion',
    notes: "Hung on a studded wall: fixings and their loads are for the fitter to choose from the fixing maker's data.",
  },
  [
    flapUnit('flap-left', 'Flap unit, left'),
    flapUnit('flap-right', 'Flap unit, right'),
    {
      id: 'shelves', name: 'Open shelves', width: 900, height: 1202, depth: 300, material: 'plywood-18',
      thickness: 18, back: { type: 'inset' }, construction: 'screws', mounting: { type: 'wall' },
      shelves: { type: 'adjustable', count: 4, play: 1 }, fronts: { type: 'none' },
    },
    {
      id: 'hutch', name: 'Desk hutch', width: 700, height: 1011, depth: 350, material: 'mdf-19',
      back: { type: 'inset' }, construction: 'cams', mounting: { type: 'wall' }, shelves: { type: 'none' },
      fronts: {
        type: 'sections',
        sections: [
          { height: 600, front: { type: 'doors', count: 2, overlay: 'full', reveal: 3, handleMass: 0.2 } },
          { front: { type: 'flap', reveal: 3, mechanisms: 2, handleMass: 0.2 } },
        ],
      },
    },
  ],
);
