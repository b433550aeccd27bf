import { planBox, type PanelEdgeBore, type PanelFaceBore } from '../layout/bore';
import { pairKey } from '../layout/panel-layout';
import type { DraftFinding } from './finding';
import { report, type PanelSite } from './panel-site';
import { boreName, capitalize } from './wording';

/** Whether a face bore's cylinder meets an edge bore's: in plan (circle against the edge bore's path) and in depth. */
function meets(site: PanelSite, edge: PanelEdgeBore, face: PanelFaceBore): boolean {
  const [minX, minY, maxX, maxY] = planBox(edge, site.panel);
  const dx = face.x - Math.min(Math.max(face.x, minX), maxX);
  const dy = face.y - Math.min(Math.max(face.y, minY), maxY);
  if (dx * dx + dy * dy >= (face.diameter / 2) ** 2) return false;
  const top = face.face === 'A' ? 0 : site.panel.thickness - face.depth;
  const bottom = face.face === 'A' ? face.depth : site.panel.thickness;
  const r = edge.diameter / 2;
  return Math.max(top, edge.z - r) < Math.min(bottom, edge.z + r);
}

/** How deep the edge bore could go and stop short of the face bore by the minimum web. */
function shortDepth(site: PanelSite, edge: PanelEdgeBore, face: PanelFaceBore): number {
  const r = face.diameter / 2;
  const { width, height } = site.panel;
  const reach = { x0: face.x - r, x1: width - face.x - r, y0: face.y - r, y1: height - face.y - r }[edge.edge];
  return reach - site.limits.minWeb;
}

/**
 * edge-bore-clash: an edge bore whose cylinder meets a face bore's, except the pairs a fitting is made to
 * join (a cam and its bolt's edge bore).
 */
export function checkEdgeBoreClash(site: PanelSite): DraftFinding[] {
  const { index, faceBores } = site;
  const findings: DraftFinding[] = [];
  for (const edge of site.edgeBores) {
    const [minX, minY, maxX, maxY] = planBox(edge, site.panel);
    index.search(minX, minY, maxX, maxY, (k) => {
      const face = faceBores[k];
      if (site.layout.joined.has(pairKey(edge.id, face.id)) || !meets(site, edge, face)) return;
      const message = `${capitalize(boreName(edge))} runs into ${boreName(face)} on face ${face.face}.`;
      const depth = shortDepth(site, edge, face);
      const path = edge.edge === 'x0' || edge.edge === 'x1' ? `y ${site.job.coordinate(minY)} to ${site.job.coordinate(maxY)}` : `x ${site.job.coordinate(minX)} to ${site.job.coordinate(maxX)}`;
      const shorten = depth > 0 ? `, or drill the edge bore at most ${site.job.length(depth)} deep` : '';
      findings.push(report(site, 'edge-bore-clash', 'error', message, [edge, face], { advice: `Move the face bore clear of the edge bore's path (${path})${shorten}.` }));
    });
  }
  return findings;
}
