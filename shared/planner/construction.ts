import type { SystemGrid } from '../grid/system-grid';
import type { Placement } from '../model/job-document';
import type { CarcassPlanInput } from './carcass-plan-input';

/** The fittings of each construction: the bore in the side's face and the one in the part's end. */
const CONNECTORS: Record<CarcassPlanInput['construction'], { side: string; part: string; why: string }> = {
  dowels: {
    side: 'dowel-8x30-face',
    part: 'dowel-8x30-edge',
    why: 'Ø8 × 30 dowels: 11 mm into the side, 21 mm into the part end (trade-reference §6)',
  },
  cams: {
    side: 'cam-bolt',
    part: 'cam-15',
    why: 'cam connectors: the bolt in the side, the Ø15 cam 24 mm from the part end with its Ø8 edge bore (trade-reference §6)',
  },
  screws: {
    side: 'connector-screw-7-face',
    part: 'connector-screw-7-edge',
    why: 'one-piece 7 mm connector screws: Ø7 through the side, Ø5 pilot 50 mm into the part end (trade-reference §6)',
  },
};

/** How a construction is described on screen. */
export function constructionWhy(construction: CarcassPlanInput['construction']): string {
  return CONNECTORS[construction].why;
}

/** Cam centre from the part's end (trade-reference §6, common practice). */
const CAM_FROM_EDGE = 24;
/** Connectors go on every fourth system column between the rows, so none is more than 128 mm from the next. */
const COLUMN_STEP = 4;

/**
 * The columns (x from the front edge) that carry a joint's connectors: the front and rear system rows and
 * every fourth column between, so the connectors share the sides' grid.
 */
export function connectorColumns(grid: SystemGrid): number[] {
  const [front, rear] = grid.rows;
  const steps = Math.round((rear - front) / grid.pitch);
  const columns = [front];
  for (let k = COLUMN_STEP; k < steps - 1; k += COLUMN_STEP) columns.push(front + k * grid.pitch);
  return [...columns, rear];
}

/**
 * A part (top, bottom or fixed shelf) joined between the two sides at side height `sideY`: the bores in
 * each side's inside face (face A) and in both ends of the part. In a part's frame y runs along its
 * length from the left side, so its left end is edge y0 and its right end y1.
 */
export function jointPlacements(
  construction: CarcassPlanInput['construction'],
  columns: readonly number[],
  sideY: number,
  partLength: number,
  prefix: string,
): { side: Placement[]; part: Placement[] } {
  const { side, part } = CONNECTORS[construction];
  // A cam sits in the part's face, its bolt bore running to it from the end; dowels and screws are anchored on the end itself.
  const inset = construction === 'cams' ? CAM_FROM_EDGE : 0;
  const sidePlacements = columns.map((x, i): Placement => ({ id: `${prefix}-${i + 1}`, fitting: side, x, y: sideY, face: 'A', rotation: 0 }));
  const partPlacements = columns.flatMap((x, i): Placement[] => [
    { id: `left-${i + 1}`, fitting: part, x, y: inset, face: 'A', rotation: 0 },
    { id: `right-${i + 1}`, fitting: part, x, y: partLength - inset, face: 'A', rotation: 180 },
  ]);
  return { side: sidePlacements, part: partPlacements };
}
