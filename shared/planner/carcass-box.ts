import type { LengthWording } from '../checks/wording';
import { nearestBalancedHeights, isBalancedHeight } from '../grid/balanced-height';
import { systemGrid, type SystemGrid } from '../grid/system-grid';
import type { Material } from '../model/job-document';
import type { CarcassPlanInput } from './carcass-plan-input';
import { explain, type Explained } from './explained';

/** The box before its fronts: board, depths left by the back, and the sides' system rows. */
export interface CarcassBox {
  board: Material;
  /** Board thickness T of sides, top and bottom. */
  thickness: number;
  /** Depth the back takes from the rear of the top, bottom and shelves' room. */
  backAllowance: Explained;
  /** Front to back of top and bottom. */
  partDepth: Explained;
  /** Front to back of a shelf: clear of the back. */
  shelfDepth: Explained;
  /** Between the sides. */
  innerWidth: Explained;
  grid: SystemGrid;
  rows: { front: Explained; rear: Explained; firstHole: Explained; lastHole: Explained };
  balance: { balanced: boolean; below: number | null; above: number; why: string };
}

/** A problem with the input, led by the path of the value it concerns. */
export type PlanError = string;

/** The depth the back takes from the rear: the row behind it keeps the setback to the back's front face. */
function backAllowance(input: CarcassPlanInput, thickness: number, materials: ReadonlyMap<string, Material>, words: LengthWording): Explained {
  const { back } = input;
  if (back.type === 'none') return explain(0, 'no back');
  if (back.type === 'inset') return explain(thickness, `an inset back of the carcass board, ${words.length(thickness)}, between sides, top and bottom`);
  const tb = materials.get(back.material)?.thickness ?? 0;
  return explain(back.setIn + tb, `the groove's set-in ${words.length(back.setIn)} plus the ${words.length(tb)} back`);
}

/**
 * Lays out the box: its board, the room the back takes and the sides' system rows (front row at the
 * setback, rear row a whole number of pitches behind it and the setback clear of the back; holes from
 * half the board thickness, trade-reference §1). Refuses a board the material does not come in and a
 * depth too shallow for the rear row. Its reasons word lengths as `words` says.
 */
export function planBox(input: CarcassPlanInput, words: LengthWording): { box: CarcassBox } | { errors: PlanError[] } {
  const materials = new Map(input.materials.map((m) => [m.id, m]));
  const errors: PlanError[] = [];
  const board = materials.get(input.material);
  for (const [path, id] of [
    ['material', input.material],
    ['back.material', input.back.type === 'grooved' ? input.back.material : undefined],
    ['fronts.material', 'material' in input.fronts ? input.fronts.material : undefined],
  ] as const) {
    if (id !== undefined && !materials.has(id)) errors.push(`${path}: no material with id "${id}" among the job's materials`);
  }
  if (!board) return { errors };
  if (input.thickness !== undefined && input.thickness !== board.thickness) {
    const others = input.materials.filter((m) => m.thickness === input.thickness).map((m) => m.id);
    const hint = others.length > 0 ? `; ${words.length(input.thickness)} board: ${others.join(', ')}` : '';
    errors.push(`thickness: ${board.name} comes in ${words.length(board.thickness)} only, not ${words.length(input.thickness)}${hint}`);
  }
  if (errors.length > 0) return { errors };
  const T = board.thickness;
  const { system, width, height, depth } = input;
  const allowance = backAllowance(input, T, materials, words);
  const grid = systemGrid({ width: depth, height }, T, system, system.setback + allowance.value);
  if (grid.rows.length < 2) {
    const least = 2 * system.setback + system.pitch + allowance.value;
    errors.push(
      `depth: ${words.length(depth)} leaves no room for the rear system row: it sits a whole ${words.system(system.pitch)} pitch behind the front row at ${words.system(system.setback)} and keeps ${words.system(system.setback)} clear of the back (${allowance.why}); make the carcass at least ${words.length(least)} deep`,
    );
  }
  if (width <= 2 * T + system.pitch) errors.push(`width: ${words.length(width)} leaves no room between two ${words.length(T)} sides`);
  if (height <= 2 * T + 2 * system.pitch) errors.push(`height: ${words.length(height)} leaves no room between a ${words.length(T)} top and bottom`);
  if (errors.length > 0) return { errors };
  const balanced = isBalancedHeight(height, T, system.pitch);
  const near = nearestBalancedHeights(height, T, system.pitch);
  const rule = `a side is balanced when its height is ${words.system(system.pitch)} × n + T (T = ${words.length(T)}), so the last hole sits as far below the top as the first above the bottom`;
  return {
    box: {
      board,
      thickness: T,
      backAllowance: allowance,
      partDepth: explain(depth - (input.back.type === 'inset' ? T : 0), input.back.type === 'inset' ? 'the depth less the inset back' : input.back.type === 'grooved' ? 'the full depth; the back runs in its groove' : 'the full depth'),
      shelfDepth: explain(depth - allowance.value, allowance.value > 0 ? `the depth less the back's room (${allowance.why})` : 'the full depth'),
      innerWidth: explain(width - 2 * T, `the width less two ${words.length(T)} sides`),
      grid,
      rows: {
        front: explain(grid.rows[0], `the front row at the setback, ${words.system(system.setback)} from the front edge`),
        rear: explain(grid.rows[1], `the furthest whole ${words.system(system.pitch)} pitch behind the front row that keeps ${words.system(system.setback)} clear of the back`),
        firstHole: explain(grid.firstY, `half the ${words.length(T)} bottom: the first hole is centred on the bottom's joint`),
        lastHole: explain(grid.lastY, `the highest whole pitch above the first hole; ${words.length(height - grid.lastY)} below the top`),
      },
      balance: {
        balanced,
        below: near.below,
        above: near.above,
        why: balanced ? `balanced: ${rule}` : `not balanced (${rule}); the nearest balanced heights are ${near.below === null ? '' : `${words.length(near.below)} and `}${words.length(near.above)}`,
      },
    },
  };
}
