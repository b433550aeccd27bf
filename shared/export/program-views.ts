import { EDGE_NAME } from '../checks/edges';
import type { Edge, Panel } from '../model/job-document';
import type { TourPoint } from './drill-tour';
import type { EdgeHole, FaceHole } from './map-view';
import type { PanelHole } from './panel-holes';

/** What a drilling program drills: a face, or an edge with the panel clamped on edge. */
export type ProgramSide = 'face-a' | 'face-b' | `edge-${Edge}`;

/**
 * One side of a panel as it lies up on the machine, seen from above from the machine's front: its holes,
 * its size along X (`length`) and Y (`across`), how high it stands above the table, where each hole lies
 * in its plane (u along X from its left end, v along Y from its front) and what lies at each side of it.
 */
export interface ProgramView {
  side: ProgramSide;
  holes: PanelHole[];
  length: number;
  across: number;
  height: number;
  place: (hole: PanelHole) => TourPoint;
  /** What lies up, and which of the panel's edges or faces are at the left, right, front and back. */
  up: string;
  left: string;
  right: string;
  front: string;
  back: string;
  /** Where the reference edge (x = 0) lies. */
  reference: string;
}

const EDGES: readonly Edge[] = ['x0', 'x1', 'y0', 'y1'];

/**
 * How the panel lies with one edge up, face A toward the front, turned from face A's drilling map (the
 * reference edge on the left, the lower edge below): where an edge hole lies along X, and which ends of
 * the edge are at the left and right. `at` runs along y on edges x0 and x1, along x on y0 and y1.
 */
function edgeLie(edge: Edge, panel: Panel): { length: number; height: number; u: (at: number) => number; left: Edge; right: Edge; reference: string } {
  const { width: W, height: H } = panel;
  switch (edge) {
    // Map turned a quarter clockwise: its left edge goes up, its upward y runs to the right.
    case 'x0':
      return { length: H, height: W, u: (at) => at, left: 'y0', right: 'y1', reference: 'up' };
    // A quarter anticlockwise: the far edge up, y runs to the left.
    case 'x1':
      return { length: H, height: W, u: (at) => H - at, left: 'y1', right: 'y0', reference: 'down, on the table' };
    // Half a turn: the lower edge up, x runs to the left.
    case 'y0':
      return { length: W, height: H, u: (at) => W - at, left: 'x1', right: 'x0', reference: 'at the right end' };
    // As drawn: the upper edge up, x runs to the right.
    case 'y1':
      return { length: W, height: H, u: (at) => at, left: 'x0', right: 'x1', reference: 'at the left end' };
  }
}

/**
 * The programs a panel's holes need, each with the holes it drills: face A's holes with face A up, as on
 * its drilling map; face B's with face B up, turned over sideways as on its map (the reference edge
 * then on the right, the lower edge still at the front); and each edge with holes with that edge up, face A toward the front.
 * A side without holes needs no program; every hole is in exactly one.
 */
export function programViews(panel: Panel, holes: readonly PanelHole[]): ProgramView[] {
  const { width: W, height: H, thickness: T } = panel;
  const views: ProgramView[] = [];
  for (const face of ['A', 'B'] as const) {
    const onFace = holes.filter((h): h is FaceHole => h.kind === 'face' && h.face === face);
    if (onFace.length === 0) continue;
    views.push({
      side: face === 'A' ? 'face-a' : 'face-b',
      holes: onFace,
      length: W,
      across: H,
      height: T,
      place: (h) => ({ u: face === 'A' ? (h as FaceHole).x : W - (h as FaceHole).x, v: (h as FaceHole).y }),
      up: `face ${face}`,
      left: EDGE_NAME[face === 'A' ? 'x0' : 'x1'],
      right: EDGE_NAME[face === 'A' ? 'x1' : 'x0'],
      front: EDGE_NAME.y0,
      back: EDGE_NAME.y1,
      reference: face === 'A' ? 'at the left' : 'at the right',
    });
  }
  for (const edge of EDGES) {
    const onEdge = holes.filter((h): h is EdgeHole => h.kind === 'edge' && h.edge === edge);
    if (onEdge.length === 0) continue;
    const lie = edgeLie(edge, panel);
    views.push({
      side: `edge-${edge}`,
      holes: onEdge,
      length: lie.length,
      across: T,
      height: lie.height,
      place: (h) => ({ u: lie.u((h as EdgeHole).at), v: (h as EdgeHole).z }),
      up: `edge ${edge} (${EDGE_NAME[edge]})`,
      left: `the end at ${EDGE_NAME[lie.left]}`,
      right: `the end at ${EDGE_NAME[lie.right]}`,
      front: 'face A',
      back: 'face B',
      reference: lie.reference,
    });
  }
  return views;
}
