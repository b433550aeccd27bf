/** A carcass description the planner accepts: a doweled wall box with two doors. */
export const PLANNED_CARCASS = {
  width: 600,
  height: 723,
  depth: 320,
  material: 'mdf-19',
  back: { type: 'none' },
  construction: 'dowels',
  fronts: { type: 'doors', count: 2, overlay: 'full', reveal: 3 },
  shelves: { type: 'none' },
  mounting: { type: 'wall' },
};
