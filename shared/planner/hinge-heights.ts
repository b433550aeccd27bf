import { mm } from '../checks/wording';
import { GRID_TOLERANCE, holeHeights, type SystemGrid } from '../grid/system-grid';
import { explain, type Explained } from './explained';
import type { HingeFitting, PlateFitting } from './hinge-choice';

/** The first and last cup sit 76 to 100 mm from the door's ends (trade-reference §2, common practice). */
export const CUP_FROM_END = { min: 76, max: 100 } as const;

/** One hinge: the cup's height on the door and its plate's height on the panel it hangs on. */
export interface HingeHeight {
  cup: Explained;
  plate: number;
}

/**
 * The plate heights whose every hole lands on a system hole of the panel the door hangs on: the plate is
 * anchored between its holes, so its anchor sits at a hole less the plate's lowest hole offset.
 */
function plateHeights(grid: SystemGrid, plate: PlateFitting, clear: HoleClear): number[] {
  const holes = holeHeights(grid);
  const faceBores = plate.bores.filter((b) => b.kind === 'face');
  const onHole = (y: number) => holes.some((h) => Math.abs(h - y) <= GRID_TOLERANCE);
  const low = Math.min(...faceBores.map((b) => b.y));
  const x = grid.rows[0];
  return holes
    .map((h) => h - low)
    .filter((s) => faceBores.every((b) => onHole(s + b.y) && clear({ x: x + b.x, y: s + b.y, diameter: b.diameter })));
}

/** Whether a new face bore keeps clear of what the panel already carries. */
export type HoleClear = (hole: { x: number; y: number; diameter: number }) => boolean;

/** Distance from a value to a range: 0 inside it. */
function outside(value: number, range: { min: number; max: number }): number {
  return Math.max(range.min - value, value - range.max, 0);
}

/**
 * The heights of a door's hinges along its hinge edge: the first and last cup 76 to 100 mm from the
 * door's ends (nearest that range when no system hole allows it, with a note), the others spread evenly
 * between, each where its plate's holes land on system holes of the panel it hangs on (`dy`: the door's
 * y = 0 on that panel) and clear of what that panel already carries. Hinges closer than the cup's body would clash: then the door is too short.
 */
export function hingeHeights(
  count: number,
  doorLength: number,
  dy: number,
  grid: SystemGrid,
  hinge: HingeFitting,
  plate: PlateFitting,
  clear: HoleClear = () => true,
): { hinges: HingeHeight[]; notes: string[] } | { error: string } {
  const cups = plateHeights(grid, plate, clear).map((s) => s - dy).filter((c) => c > 0 && c < doorLength);
  const body = Math.max(...hinge.keepOuts.map((k) => k.height), 0);
  if (cups.length < count) return { error: `fronts: the front is too short for ${count} hinges on system holes` };
  const nearest = (distance: (c: number) => number) => cups.reduce((a, b) => (distance(b) < distance(a) ? b : a));
  const first = nearest((c) => outside(c, CUP_FROM_END));
  const last = nearest((c) => outside(doorLength - c, CUP_FROM_END));
  const notes: string[] = [];
  for (const [c, end, fromEnd] of [[first, 'first', first], [last, 'last', doorLength - last]] as const) {
    if (outside(fromEnd, CUP_FROM_END) > 0)
      notes.push(`The ${end} hinge's cup is ${mm(fromEnd)} from the front's end, outside 76 to 100 mm: no system hole allows it at this height (cup at ${mm(c)}).`);
  }
  const chosen = [first];
  for (let i = 1; i < count - 1; i++) {
    const target = first + ((last - first) * i) / (count - 1);
    chosen.push(nearest((c) => Math.abs(c - target)));
  }
  chosen.push(last);
  const tooClose = chosen.some((c, i) => i > 0 && c - chosen[i - 1] < body);
  if (tooClose) {
    return { error: `fronts: the front is ${mm(doorLength)} along its hinge edge, too short for ${count} hinges ${mm(body)} apart with the first and last 76 to 100 mm from its ends` };
  }
  const grid32 = `its plate's holes on system holes`;
  return {
    notes,
    hinges: chosen.map((c, i) => ({
      plate: c + dy,
      cup: explain(
        c,
        i === 0
          ? `${mm(c)} from the end at y = 0 (76 to 100 mm), ${grid32}`
          : i === count - 1
            ? `${mm(doorLength - c)} from the far end (76 to 100 mm), ${grid32}`
            : `spread evenly between the outer hinges, ${grid32}`,
      ),
    })),
  };
}
