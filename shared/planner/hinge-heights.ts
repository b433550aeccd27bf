import { CUP_FROM_END } from '../checks/hinge-end-distance';
import type { LengthWording } from '../checks/wording';
import { GRID_TOLERANCE, holeHeights, type SystemGrid } from '../grid/system-grid';
import { explain, type Explained } from './explained';
import type { HingeFitting, PlateFitting } from './hinge-choice';

/** Where plates may go on the panel a front hangs on: its system holes (a side), or anywhere along it (a top that is not line-bored). */
export type PlateRows = 'system-holes' | 'free';

/** One hinge: the cup's height on the door and its plate's height on the panel it hangs on. */
export interface HingeHeight {
  cup: Explained;
  plate: number;
}

/**
 * The plate heights the panel the door hangs on allows, clear of what it already carries. On system holes,
 * every hole of the plate lands on one: the plate is anchored between its holes, so its anchor sits at a
 * hole less the plate's lowest hole offset. Free, any whole millimetre between the first and last hole
 * heights.
 */
function plateHeights(grid: SystemGrid, plate: PlateFitting, clear: HoleClear, rows: PlateRows): number[] {
  const holes = holeHeights(grid);
  const faceBores = plate.bores.filter((b) => b.kind === 'face');
  const low = Math.min(...faceBores.map((b) => b.y));
  const x = grid.rows[0];
  const clearAt = (s: number) => faceBores.every((b) => clear({ x: x + b.x, y: s + b.y, diameter: b.diameter }));
  if (rows === 'free') {
    const high = Math.max(...faceBores.map((b) => b.y));
    const from = Math.ceil(grid.firstY - low);
    return Array.from({ length: Math.max(Math.floor(grid.lastY - high) - from + 1, 0) }, (_, i) => from + i).filter(clearAt);
  }
  const onHole = (y: number) => holes.some((h) => Math.abs(h - y) <= GRID_TOLERANCE);
  return holes.map((h) => h - low).filter((s) => faceBores.every((b) => onHole(s + b.y)) && clearAt(s));
}

/** Whether a new face bore keeps clear of what the panel already carries. */
export type HoleClear = (hole: { x: number; y: number; diameter: number }) => boolean;

/** Distance from a value to a range, 0 inside it, with the middle of the range preferred among values inside. */
function outside(value: number, range: { min: number; max: number }): number {
  const middle = (range.min + range.max) / 2;
  return Math.max(range.min - value, value - range.max, 0) + Math.abs(value - middle) / 1000;
}

/**
 * The heights of a door's hinges along its hinge edge: the first and last cup 76 to 100 mm from the
 * door's ends, as near the middle of that range as the plates allow (nearest the range when nothing in it
 * does; the hinge-end-distance check then reports it with the job), the others spread evenly between, each
 * where the panel it hangs on takes its plate (`dy`: the door's y = 0 on that panel; `rows`: on its system
 * holes or anywhere along it) clear of what that panel already carries. Hinges closer than the cup's body
 * would clash: then the door is too short.
 */
export function hingeHeights(
  words: LengthWording,
  count: number,
  doorLength: number,
  dy: number,
  grid: SystemGrid,
  hinge: HingeFitting,
  plate: PlateFitting,
  clear: HoleClear = () => true,
  rows: PlateRows = 'system-holes',
): { hinges: HingeHeight[] } | { error: string } {
  const cups = plateHeights(grid, plate, clear, rows).map((s) => s - dy).filter((c) => c > 0 && c < doorLength);
  const body = Math.max(...hinge.keepOuts.map((k) => k.height), 0);
  if (cups.length < count) return { error: `fronts: the front is too short for ${count} hinges on system holes` };
  const nearest = (distance: (c: number) => number) => cups.reduce((a, b) => (distance(b) < distance(a) ? b : a));
  const first = nearest((c) => outside(c, CUP_FROM_END));
  const last = nearest((c) => outside(doorLength - c, CUP_FROM_END));
  const chosen = [first];
  for (let i = 1; i < count - 1; i++) {
    const target = first + ((last - first) * i) / (count - 1);
    chosen.push(nearest((c) => Math.abs(c - target)));
  }
  chosen.push(last);
  const ends = `${words.length(CUP_FROM_END.min)} to ${words.length(CUP_FROM_END.max)}`;
  const tooClose = chosen.some((c, i) => i > 0 && c - chosen[i - 1] < body);
  if (tooClose) {
    return { error: `fronts: the front is ${words.length(doorLength)} along its hinge edge, too short for ${count} hinges ${words.length(body)} apart with the first and last ${ends} from its ends` };
  }
  const grid32 = rows === 'free' ? 'its plate clear of the joints' : `its plate's holes on system holes`;
  return {
    hinges: chosen.map((c, i) => ({
      plate: c + dy,
      cup: explain(
        c,
        i === 0
          ? `${words.length(c)} from the end at y = 0 (${ends}), ${grid32}`
          : i === count - 1
            ? `${words.length(doorLength - c)} from the far end (${ends}), ${grid32}`
            : `spread evenly between the outer hinges, ${grid32}`,
      ),
    })),
  };
}
