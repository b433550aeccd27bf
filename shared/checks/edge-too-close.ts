import { edgeLength, type PanelBore, type PanelEdgeBore, type PanelFaceBore } from '../layout/bore';
import { EDGE_NAME, INWARD, edgeClearance, nearestEdge } from './edges';
import type { DraftFinding } from './finding';
import { moveBoreTo } from './fix-moves';
import { collect, report, type PanelSite, type Remedy } from './panel-site';
import { boreName, capitalize, formatNumber } from './wording';

/**
 * The edge distance a bore needs: the shop's minimum, and for a construction bore (a dowel) at least its
 * radius (trade-reference §6 and §7).
 */
function required(site: PanelSite, bore: PanelBore): number {
  return bore.purpose === 'construction' ? Math.max(site.limits.minEdge, bore.diameter / 2) : site.limits.minEdge;
}

/** The fix that moves the bore (or, for a fitting's bore, its placement) in by `shift`, rounded up to half a millimetre. */
function movedIn(site: PanelSite, bore: PanelFaceBore, direction: [number, number], shift: number): Remedy {
  const step = Math.ceil(shift * 2) / 2;
  const to = { x: bore.x + direction[0] * step, y: bore.y + direction[1] * step };
  return { candidates: () => [[moveBoreTo(site, bore, to, `, ${site.job.length(step)} further in`)]], advice: `Move it at least ${site.job.length(shift)} further in.` };
}

function faceBoreFinding(site: PanelSite, bore: PanelFaceBore): DraftFinding | null {
  const need = required(site, bore);
  const clearance = edgeClearance(bore, site.panel);
  // A bore that crosses the edge is outside the panel, which another check reports.
  if (clearance < 0 || clearance >= need) return null;
  const nearest = nearestEdge(bore, site.panel);
  const message = `${capitalize(boreName(bore))} is ${site.job.length(nearest.distance)} from ${EDGE_NAME[nearest.edge]}; keep at least ${site.job.length(need)}.`;
  return report(site, 'edge-too-close', 'error', message, [bore], movedIn(site, bore, INWARD[nearest.edge], need - nearest.distance));
}

function edgeBoreFinding(site: PanelSite, bore: PanelEdgeBore): DraftFinding | null {
  const r = bore.diameter / 2;
  const along = edgeLength(bore.edge, site.panel);
  const [start, end] = bore.edge === 'x0' || bore.edge === 'x1' ? ['the lower edge', 'the upper edge'] : ['the reference edge', 'the far edge'];
  const walls = [
    { name: 'face A', distance: bore.z - r, need: site.limits.minEdge },
    { name: 'face B', distance: site.panel.thickness - bore.z - r, need: site.limits.minEdge },
    { name: start, distance: bore.at - r, need: required(site, bore) },
    { name: end, distance: along - bore.at - r, need: required(site, bore) },
  ];
  const thin = walls.find((w) => w.distance >= 0 && w.distance < w.need);
  if (!thin || walls.some((w) => w.distance < 0)) return null;
  const message = `${capitalize(boreName(bore))} leaves ${site.job.length(thin.distance)} of board to ${thin.name}; keep at least ${site.job.length(thin.need)}.`;
  return report(site, 'edge-too-close', 'error', message, [bore], { advice: `Move it ${site.job.length(thin.need - thin.distance)} away from ${thin.name}.` });
}

/** edge-too-close: a bore nearer an edge (or, in an edge, nearer a face) than the shop's minimum. */
export function checkEdgeTooClose(site: PanelSite): DraftFinding[] {
  return [...collect(site.faceBores, (b) => faceBoreFinding(site, b)), ...collect(site.edgeBores, (b) => edgeBoreFinding(site, b))];
}
