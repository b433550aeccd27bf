import type { Face, Panel } from '../model/job-document';
import type { PanelHole } from './panel-holes';

/** A face hole of the panel's one hole list. */
export type FaceHole = Extract<PanelHole, { kind: 'face' }>;
/** An edge hole of the panel's one hole list. */
export type EdgeHole = Extract<PanelHole, { kind: 'edge' }>;

/**
 * One drilling map of a panel: the holes of one face as seen from that face. Face A's map also shows the
 * edge holes, whose height is measured from face A. Face B is seen from behind, so its x runs from the
 * right: the reference edge (x = 0) is then on the right, and every x still reads from it.
 */
export interface MapView {
  face: Face;
  panel: Panel;
  faceBores: FaceHole[];
  edgeBores: EdgeHole[];
  /** Holes on the other face, named on this map so that no one drills them from here. */
  otherFaceCount: number;
}

/** The maps a panel needs: always face A, and face B when it has holes of its own. */
export function mapViews(panel: Panel, holes: readonly PanelHole[]): MapView[] {
  const onFace = (face: Face) => holes.filter((h): h is FaceHole => h.kind === 'face' && h.face === face);
  const a = onFace('A');
  const b = onFace('B');
  const edges = holes.filter((h): h is EdgeHole => h.kind === 'edge');
  const views: MapView[] = [{ face: 'A', panel, faceBores: a, edgeBores: edges, otherFaceCount: b.length }];
  if (b.length > 0) views.push({ face: 'B', panel, faceBores: b, edgeBores: [], otherFaceCount: a.length });
  return views;
}

/** Where a point of the panel frame (x from the reference edge, y up from the lower edge) lies on the sheet, relative to the outline's top left. */
export function viewPoint(view: MapView, x: number, y: number): { x: number; y: number } {
  return { x: view.face === 'A' ? x : view.panel.width - x, y: view.panel.height - y };
}

/** Where the reference edge lies on a map of this face, as the bench reads it. */
export function referenceSide(face: Face): 'left' | 'right' {
  return face === 'A' ? 'left' : 'right';
}
