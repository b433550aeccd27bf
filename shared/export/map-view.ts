import type { Hand } from '../layout/side-hand';
import type { Face, Panel } from '../model/job-document';
import type { PanelDrilling } from './panel-drilling';
import type { PanelHole } from './panel-holes';

/** A face hole of the panel's one hole list. */
export type FaceHole = Extract<PanelHole, { kind: 'face' }>;
/** An edge hole of the panel's one hole list. */
export type EdgeHole = Extract<PanelHole, { kind: 'edge' }>;

/**
 * One drilling map of a panel: the holes of one face as truly seen from that face, never its mirror image,
 * so that a template laid on the face lines up with the panel's own edges. Face A's map also shows the edge
 * holes, whose height is measured from face A. Every x still reads from the reference edge, wherever the
 * view puts it (`referenceAt`).
 */
export interface MapView {
  face: Face;
  panel: Panel;
  /** The side of the sheet the reference edge (x = 0) lies on, the lower edge being at the bottom. */
  referenceAt: 'left' | 'right';
  faceBores: FaceHole[];
  edgeBores: EdgeHole[];
  /** Holes on the other face, named on this map so that no one drills them from here. */
  otherFaceCount: number;
}

/**
 * Whether the job document's frame (design.md §3: x from the reference edge, y up from the lower edge, seen on
 * face A) is face A's mirror image rather than its true view. Drawn with the reference edge on the left, it
 * is the true view of a left side's inside face, whose front edge is on the left as one looks at it from
 * inside the carcass. A right side is the left's mirror image: looking at its inside face, the front edge is
 * on the right. A door's face A is its back, looked at from inside the carcass, where a door hinged on the
 * left (seen from the front) has its hinge edge on the right, and one hinged on the right on the left
 * (geometry of handed parts, common practice: a right-hand part's template is the left-hand one turned over).
 * Other panels, and panels whose hand is not told, keep the document's frame.
 */
function frameMirrored(role: Panel['role'], hand: Hand | undefined): boolean {
  if (role === 'side') return hand === 'right';
  if (role === 'door') return hand === 'left';
  return false;
}

/**
 * Where the reference edge lies when a face is looked at with its lower edge down: face B, seen from the
 * other side, is face A's mirror.
 */
export function referenceAt(face: Face, role: Panel['role'], hand: Hand | undefined): 'left' | 'right' {
  return (face === 'B') !== frameMirrored(role, hand) ? 'right' : 'left';
}

/** The maps a panel needs: always face A, and face B when it has holes of its own. */
export function mapViews(drilling: Pick<PanelDrilling, 'panel' | 'holes' | 'hand'>): MapView[] {
  const { panel, holes } = drilling;
  const hand = drilling.hand?.hand;
  const onFace = (face: Face) => holes.filter((h): h is FaceHole => h.kind === 'face' && h.face === face);
  const a = onFace('A');
  const b = onFace('B');
  const edges = holes.filter((h): h is EdgeHole => h.kind === 'edge');
  const views: MapView[] = [{ face: 'A', panel, referenceAt: referenceAt('A', panel.role, hand), faceBores: a, edgeBores: edges, otherFaceCount: b.length }];
  if (b.length > 0) views.push({ face: 'B', panel, referenceAt: referenceAt('B', panel.role, hand), faceBores: b, edgeBores: [], otherFaceCount: a.length });
  return views;
}

/** Where a point of the panel frame (x from the reference edge, y up from the lower edge) lies on the sheet, relative to the outline's top left. */
export function viewPoint(view: MapView, x: number, y: number): { x: number; y: number } {
  return { x: view.referenceAt === 'left' ? x : view.panel.width - x, y: view.panel.height - y };
}
