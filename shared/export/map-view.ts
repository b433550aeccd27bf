import type { PanelBore, PanelEdgeBore, PanelFaceBore } from '../layout/bore';
import type { Face, Panel } from '../model/job-document';
import { roundTo } from './units';

/**
 * One drilling map of a panel: the bores of one face as seen from that face. Face A's map also shows the
 * edge bores, whose height is measured from face A. Face B is seen from behind, so its x runs from the
 * right: the reference edge (x = 0) is then on the right, and every x still reads from it.
 */
export interface MapView {
  face: Face;
  panel: Panel;
  faceBores: PanelFaceBore[];
  edgeBores: PanelEdgeBore[];
  /** Bores on the other face, named on this map so that no one drills them from here. */
  otherFaceCount: number;
}

/**
 * Face bores that are one hole, as when a plate screw goes into a line-bored system hole, drawn once: as the
 * fitting's rather than a loose bore, and as deep as the deepest of them, since that is what gets drilled.
 */
export function oneMarkPerHole(bores: readonly PanelFaceBore[]): PanelFaceBore[] {
  const holes = new Map<string, PanelFaceBore>();
  for (const bore of bores) {
    const key = [bore.face, roundTo(bore.x, 0.01), roundTo(bore.y, 0.01), bore.diameter].join(' ');
    const seen = holes.get(key);
    if (!seen) {
      holes.set(key, bore);
      continue;
    }
    const named = seen.purpose === 'loose' ? bore : seen;
    holes.set(key, { ...named, depth: Math.max(seen.depth, bore.depth), through: seen.through || bore.through });
  }
  return [...holes.values()];
}

/** The maps a panel needs: always face A, and face B when it has bores of its own. */
export function mapViews(panel: Panel, bores: readonly PanelBore[]): MapView[] {
  const onFace = (face: Face) => oneMarkPerHole(bores.filter((b): b is PanelFaceBore => b.kind === 'face' && b.face === face));
  const a = onFace('A');
  const b = onFace('B');
  const edges = bores.filter((x): x is PanelEdgeBore => x.kind === 'edge');
  const views: MapView[] = [{ face: 'A', panel, faceBores: a, edgeBores: edges, otherFaceCount: b.length }];
  if (b.length > 0) views.push({ face: 'B', panel, faceBores: b, edgeBores: [], otherFaceCount: a.length });
  return views;
}

/** Where a point of the panel frame (x from the reference edge, y up from the lower edge) lies on the sheet, relative to the outline's top left. */
export function viewPoint(view: MapView, x: number, y: number): { x: number; y: number } {
  return { x: view.face === 'A' ? x : view.panel.width - x, y: view.panel.height - y };
}
