import { plannedJob } from './planned-job';

const onPlinth = { type: 'kickboard', height: 150, setBack: 50 } as const;

/**
 * The Larch Lane kitchen: a sink base with one door, a drawer base and a wall unit over the sink.
 * 722 = 32 · 22 + 18: the balanced height nearest the usual 720, so the rows end 9 mm below the top as
 * they start 9 mm above the bottom.
 */
export const larchLaneKitchen = plannedJob(
  {
    name: 'Larch Lane kitchen',
    client: 'The Okafor family, 7 Larch Lane',
    notes: 'Base units stand on a 150 mm plinth. Doors and drawer fronts are drilled before they go out for lacquer.',
  },
  [
    {
      id: 'sink-base', name: 'Sink base', width: 600, height: 722, depth: 560, material: 'particleboard-18',
      back: { type: 'none' }, construction: 'dowels', mounting: onPlinth, shelves: { type: 'none' },
      fronts: { type: 'doors', count: 1, overlay: 'full', reveal: 3, hingeSide: 'left', material: 'mdf-19', handleMass: 0.2 },
    },
    {
      id: 'drawer-base', name: 'Drawer base', width: 500, height: 722, depth: 560, material: 'particleboard-18',
      back: { type: 'inset' }, construction: 'cams', mounting: onPlinth, shelves: { type: 'none' },
      fronts: { type: 'drawers', count: 3, reveal: 3, material: 'mdf-19' },
    },
    {
      id: 'wall-unit', name: 'Wall unit', width: 800, height: 722, depth: 320, material: 'particleboard-18',
      back: { type: 'inset' }, construction: 'cams', mounting: { type: 'wall' },
      shelves: { type: 'adjustable', count: 2, play: 1 },
      fronts: { type: 'doors', count: 2, overlay: 'full', reveal: 3, material: 'mdf-19', handleMass: 0.2 },
    },
  ],
);
