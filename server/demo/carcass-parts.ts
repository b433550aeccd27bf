import { holeHeights, systemGrid } from '../../shared/grid/system-grid';
import type { Carcass, FaceBore, JobDocumentInput, Material, SystemSettings } from '../../shared/model/job-document';

type PanelInput = NonNullable<JobDocumentInput['panels']>[number];

/** The demo jobs' 32 mm settings: the trade's common values (trade-reference §1). */
export const DEMO_SYSTEM: SystemSettings = { pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 };

export interface Box {
  carcass: Carcass;
  board: Material;
}

/** A carcass of one board: sides full height, top and bottom between them. */
export function box(id: string, name: string, size: { width: number; height: number; depth: number }, board: Material, mounting: Carcass['mounting'] = 'floor'): Box {
  return { carcass: { id, name, ...size, material: board.id, mounting }, board };
}

/**
 * Line boring on the inside face (face A) of a side: Ø5 system holes on the front and rear rows,
 * from half the board thickness up, 32 mm apart (shared/grid). Loose bores: catalog placements come later.
 */
function systemRows(width: number, height: number, thickness: number): FaceBore[] {
  const grid = systemGrid({ width, height }, thickness, DEMO_SYSTEM);
  return grid.rows.flatMap((x, row) =>
    holeHeights(grid).map((y, k) => ({
      id: `${row === 0 ? 'front' : 'rear'}-${k}`,
      x,
      y,
      face: 'A' as const,
      diameter: DEMO_SYSTEM.holeDiameter,
      depth: DEMO_SYSTEM.holeDepth,
    })),
  );
}

const part = ({ carcass, board }: Box, id: string, name: string, role: PanelInput['role'], width: number, height: number): PanelInput => ({
  id: `${carcass.id}-${id}`,
  name,
  role,
  carcass: carcass.id,
  width,
  height,
  thickness: board.thickness,
  material: board.id,
});

/** Left and right side (x front to back, so their width is the carcass depth), line-bored. */
export function sides(b: Box): PanelInput[] {
  const { depth, height } = b.carcass;
  return (['left', 'right'] as const).map((side) => ({
    ...part(b, side, `${b.carcass.name}, ${side} side`, 'side', depth, height),
    bores: systemRows(depth, height, b.board.thickness),
  }));
}

/** Top and bottom between the sides: x front to back, y along the carcass width. */
export function topAndBottom(b: Box): PanelInput[] {
  const inner = b.carcass.width - 2 * b.board.thickness;
  return [
    part(b, 'top', `${b.carcass.name}, top`, 'top', b.carcass.depth, inner),
    part(b, 'bottom', `${b.carcass.name}, bottom`, 'bottom', b.carcass.depth, inner),
  ];
}

/** A shelf fixed between the sides, full depth and full length. */
export function fixedShelf(b: Box, id: string, name: string): PanelInput {
  return part(b, id, name, 'shelf', b.carcass.depth, b.carcass.width - 2 * b.board.thickness);
}

/** Shelves between the sides, set back from the front edge and 1 mm short at each end so they lift out. */
export function shelves(b: Box, count: number, setBack: number): PanelInput[] {
  const length = b.carcass.width - 2 * b.board.thickness - 2;
  return Array.from({ length: count }, (_, i) => part(b, `shelf-${i + 1}`, `${b.carcass.name}, shelf ${i + 1}`, 'shelf', b.carcass.depth - setBack, length));
}

/**
 * A front of the carcass: a door or flap hung on its sides, or a drawer front. `x` runs from the
 * hinge edge, so a door's width is across the carcass and a flap's width is its drop (design.md §3).
 */
export function front(
  b: Box,
  spec: {
    id: string;
    name: string;
    role: 'door' | 'flap' | 'drawer-front';
    width: number;
    height: number;
    board: Material;
    handleMass: number;
    hang?: { on: ('left' | 'right')[]; dy: number };
  },
): PanelInput {
  return {
    id: `${b.carcass.id}-${spec.id}`,
    name: spec.name,
    role: spec.role,
    carcass: b.carcass.id,
    width: spec.width,
    height: spec.height,
    thickness: spec.board.thickness,
    material: spec.board.id,
    handleMass: spec.handleMass,
    ...(spec.hang && { hang: { on: spec.hang.on.map((side) => `${b.carcass.id}-${side}`), dy: spec.hang.dy } }),
  };
}
