import type { FittingPurpose } from '../catalog/fitting';
import { isEdgeBore, type Bore, type EdgeBore, type FaceBore } from '../model/job-document';

/** What a bore is for, which sets its colour: a fitting's purpose, or `loose` for one drawn by hand. */
export type BorePurpose = FittingPurpose | 'loose';

interface BoreOrigin {
  purpose: BorePurpose;
  /** The placement it was expanded from; none for a loose bore. */
  placement?: string;
}

/** A face bore as drilled: `through` when it is meant to come out on the other face. */
export interface PanelFaceBore extends FaceBore, BoreOrigin {
  kind: 'face';
  through: boolean;
}

/** An edge bore as drilled. */
export interface PanelEdgeBore extends EdgeBore, BoreOrigin {
  kind: 'edge';
}

/** One hole of a panel, loose or expanded from a placement, in the panel's frame seen on face A. */
export type PanelBore = PanelFaceBore | PanelEdgeBore;

/** A plan rectangle: [minX, minY, maxX, maxY] in the panel's frame. */
export type Box = [number, number, number, number];

/**
 * A bore drawn by hand, as drilled. The document cannot say "through", so a loose face bore at least as
 * deep as the board is taken as a through bore; a shallower one is blind.
 */
export function looseBore(bore: Bore, thickness: number): PanelBore {
  // Literals of one fixed shape, not spreads: a panel may hold thousands of bores and spreads are slow.
  const { id, diameter, depth } = bore;
  if (isEdgeBore(bore)) return { kind: 'edge', id, edge: bore.edge, at: bore.at, z: bore.z, diameter, depth, purpose: 'loose' };
  return { kind: 'face', id, x: bore.x, y: bore.y, face: bore.face, diameter, depth, purpose: 'loose', through: depth >= thickness };
}

/**
 * Whether two face bores are one hole: the same face, the same centre (within 0.01 mm) and the same
 * diameter, as when a shelf pin or a plate screw goes into a line-bored system hole.
 */
export function isSameHole(a: { x: number; y: number; face: string; diameter: number }, b: PanelFaceBore): boolean {
  return a.face === b.face && a.diameter === b.diameter && Math.abs(a.x - b.x) <= 0.01 && Math.abs(a.y - b.y) <= 0.01;
}

/** The length of an edge: edges x0 and x1 run along the panel's height, y0 and y1 along its width. */
export function edgeLength(edge: EdgeBore['edge'], panel: { width: number; height: number }): number {
  return edge === 'x0' || edge === 'x1' ? panel.height : panel.width;
}

/** How far across the panel an edge bore can go: from its edge to the opposite one. */
export function edgeSpan(edge: EdgeBore['edge'], panel: { width: number; height: number }): number {
  return edge === 'x0' || edge === 'x1' ? panel.width : panel.height;
}

/**
 * The plan area a bore takes, seen on face A: a face bore's circle as its bounding box, an edge bore's
 * path from its edge to its end.
 */
export function planBox(bore: PanelBore, panel: { width: number; height: number }): Box {
  const r = bore.diameter / 2;
  if (bore.kind === 'face') return [bore.x - r, bore.y - r, bore.x + r, bore.y + r];
  switch (bore.edge) {
    case 'x0':
      return [0, bore.at - r, bore.depth, bore.at + r];
    case 'x1':
      return [panel.width - bore.depth, bore.at - r, panel.width, bore.at + r];
    case 'y0':
      return [bore.at - r, 0, bore.at + r, bore.depth];
    case 'y1':
      return [bore.at - r, panel.height - bore.depth, bore.at + r, panel.height];
  }
}
