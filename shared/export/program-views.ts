import { EDGE_NAME } from '../checks/edges';
import type { Edge, Panel } from '../model/job-document';
import type { TourPoint } from './drill-tour';
import { referenceAt, type EdgeHole, type FaceHole } from './map-view';
import type { PanelDrilling } from './panel-drilling';
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
 * How the panel lies with one edge up, face A toward the front, turned from face A's drilling map as the face
 * is truly seen (the lower edge below, the reference edge on the left, or on the right when the document's
 * frame is the face's mirror: map-view.ts `referenceAt`): where an edge hole lies along X, and which ends of
 * the edge are at the left and right. `at` runs along y on edges x0 and x1, along x on y0 and y1.
 */
function edgeLie(edge: Edge, panel: Panel, mirrored: boolean): { length: number; height: number; u: (at: number) => number; left: Edge; right: Edge; reference: string } {
  const { width: W, height: H } = panel;
  const [mapLeft, mapRight]: [Edge, Edge] = mirrored ? ['x1', 'x0'] : ['x0', 'x1'];
  const mapU = (at: number) => (mirrored ? W - at : at);
  if (edge === 'x0' || edge === 'x1') {
    const reference = edge === 'x0' ? 'up' : 'down, on the table';
    // The map turned a quarter clockwise for the edge on its left (its upward y then runs to the right),
    // a quarter anticlockwise for the edge on its right (y runs to the left).
    return edge === mapLeft
      ? { length: H, height: W, u: (at) => at, left: 'y0', right: 'y1', reference }
      : { length: H, height: W, u: (at) => H - at, left: 'y1', right: 'y0', reference };
  }
  // The upper edge up: as drawn. The lower edge up: half a turn, the map's x reversed.
  const [left, right, u]: [Edge, Edge, (at: number) => number] = edge === 'y1' ? [mapLeft, mapRight, mapU] : [mapRight, mapLeft, (at) => W - mapU(at)];
  return { length: W, height: H, u, left, right, reference: left === 'x0' ? 'at the left end' : 'at the right end' };
}

/**
 * The programs a panel's holes need, each with the holes it drills: face A's holes with face A up, as on
 * its drilling map; face B's with face B up, turned over sideways as on its map (the reference edge then
 * on the other side, the lower edge still at the front); and each edge with holes with that edge up, face A
 * toward the front.
 * A side without holes needs no program; every hole is in exactly one.
 */
export function programViews(drilling: Pick<PanelDrilling, 'panel' | 'holes' | 'hand'>): ProgramView[] {
  const { panel, holes } = drilling;
  const { width: W, height: H, thickness: T } = panel;
  const hand = drilling.hand?.hand;
  const views: ProgramView[] = [];
  for (const face of ['A', 'B'] as const) {
    const onFace = holes.filter((h): h is FaceHole => h.kind === 'face' && h.face === face);
    if (onFace.length === 0) continue;
    const onLeft = referenceAt(face, panel.role, hand) === 'left';
    views.push({
      side: face === 'A' ? 'face-a' : 'face-b',
      holes: onFace,
      length: W,
      across: H,
      height: T,
      place: (h) => ({ u: onLeft ? (h as FaceHole).x : W - (h as FaceHole).x, v: (h as FaceHole).y }),
      up: `face ${face}`,
      left: EDGE_NAME[onLeft ? 'x0' : 'x1'],
      right: EDGE_NAME[onLeft ? 'x1' : 'x0'],
      front: EDGE_NAME.y0,
      back: EDGE_NAME.y1,
      reference: onLeft ? 'at the left' : 'at the right',
    });
  }
  for (const edge of EDGES) {
    const onEdge = holes.filter((h): h is EdgeHole => h.kind === 'edge' && h.edge === edge);
    if (onEdge.length === 0) continue;
    const lie = edgeLie(edge, panel, referenceAt('A', panel.role, hand) === 'right');
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
