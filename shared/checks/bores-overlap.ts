import { isSameHole, type PanelEdgeBore, type PanelFaceBore } from '../layout/bore';
import { pairKey } from '../layout/panel-layout';
import { nearestClearHole } from './clear-hole';
import type { Finding } from './finding';
import { report, type PanelSite } from './panel-site';
import { boreName, capitalize, formatNumber, mm } from './wording';

type AnyBore = PanelFaceBore | PanelEdgeBore;

/** A fitting's own bores sit as its maker spaced them (a cup's fixing holes leave under 3 mm), and joined bores meet by design. */
function exempt(site: PanelSite, a: AnyBore, b: AnyBore): boolean {
  return (a.placement !== undefined && a.placement === b.placement) || site.layout.joined.has(pairKey(a.id, b.id));
}

function describe(a: AnyBore, b: AnyBore, web: number, minWeb: number, where: string): string {
  const gap = web < 0 ? `overlap by ${mm(-web)}` : `leave only ${mm(web)} of board between them`;
  return `${capitalize(boreName(a))} and ${boreName(b)} ${where} ${gap}; keep at least ${mm(minWeb)}.`;
}

/** The fix for two face bores too close: a loose or shelf-pin bore of system size can go to the nearest clear system hole. */
function fixFor(site: PanelSite, a: PanelFaceBore, b: PanelFaceBore, web: number): Finding['fix'] {
  const movable = [b, a].find(
    (x) => (x.purpose === 'loose' || x.purpose === 'shelf-pin') && x.diameter <= site.system.holeDiameter,
  );
  const hole = movable && nearestClearHole(site, movable, new Set([movable.id]));
  if (movable && hole) {
    const what = movable.placement ? `placement ${movable.placement}` : movable.id;
    return { message: `Move ${what} to the nearest clear system hole, x ${formatNumber(hole.x)}, y ${formatNumber(hole.y)}.`, at: hole };
  }
  return { message: `Move one of them ${mm(site.limits.minWeb - web)} further from the other.` };
}

function edgePairs(site: PanelSite, visit: (a: PanelEdgeBore, b: PanelEdgeBore, web: number) => void): void {
  const { minWeb } = site.limits;
  const byEdge = new Map<string, PanelEdgeBore[]>();
  for (const b of site.edgeBores) byEdge.set(b.edge, [...(byEdge.get(b.edge) ?? []), b]);
  for (const bores of byEdge.values()) {
    // Sorted along the edge, a sweep only looks ahead while a pair could still come too close.
    bores.sort((p, q) => p.at - q.at);
    const widest = Math.max(...bores.map((b) => b.diameter));
    for (let i = 0; i < bores.length; i++) {
      for (let j = i + 1; j < bores.length && bores[j].at - bores[i].at < widest + minWeb; j++) {
        const [p, q] = [bores[i], bores[j]];
        const web = Math.hypot(q.at - p.at, q.z - p.z) - p.diameter / 2 - q.diameter / 2;
        if (web < minWeb) visit(p, q, web);
      }
    }
  }
}

/**
 * bores-overlap: two bores on the same face (or in the same edge) closer than the minimum web
 * (trade-reference §7: at least 3 mm of board between two bores).
 */
export function checkBoresOverlap(site: PanelSite): Finding[] {
  const { minWeb } = site.limits;
  const findings: Finding[] = [];
  for (const { a: p, b: q, web } of site.nearPairs) {
    if (p.face !== q.face || isSameHole(p, q) || exempt(site, p, q)) continue;
    const [a, b] = p.id < q.id ? [p, q] : [q, p];
    findings.push(report(site, 'bores-overlap', 'error', describe(a, b, web, minWeb, `on face ${a.face}`), [a, b], fixFor(site, a, b, web)));
  }
  edgePairs(site, (p, q, web) => {
    if (exempt(site, p, q)) return;
    const [a, b] = p.id < q.id ? [p, q] : [q, p];
    const fix = { message: `Move one of them ${mm(minWeb - web)} further from the other along the edge.` };
    findings.push(report(site, 'bores-overlap', 'error', describe(a, b, web, minWeb, `in edge ${a.edge}`), [a, b], fix));
  });
  return findings;
}
