import { isSameHole, type PanelEdgeBore, type PanelFaceBore } from '../layout/bore';
import { pairKey } from '../layout/panel-layout';
import { clearHoles } from './clear-hole';
import type { DraftFinding, Fix } from './finding';
import { MAX_CANDIDATES, moveBoreTo, moverName } from './fix-moves';
import { report, type PanelSite, type Remedy } from './panel-site';
import { boreName, capitalize } from './wording';

type AnyBore = PanelFaceBore | PanelEdgeBore;

/** A fitting's own bores sit as its maker spaced them (a cup's fixing holes leave under 3 mm), and joined bores meet by design. */
function exempt(site: PanelSite, a: AnyBore, b: AnyBore): boolean {
  return (a.placement !== undefined && a.placement === b.placement) || site.layout.joined.has(pairKey(a.id, b.id));
}

function describe(site: PanelSite, a: AnyBore, b: AnyBore, web: number, minWeb: number, where: string): string {
  const gap = web < 0 ? `overlap by ${site.job.length(-web)}` : `leave only ${site.job.length(web)} of board between them`;
  return `${capitalize(boreName(a))} and ${boreName(b)} ${where} ${gap}; keep at least ${site.job.length(minWeb)}.`;
}

/** A bore's way out: the clear system holes nearest it, or pushed straight away from the other bore far enough. */
function movesOf(site: PanelSite, mover: PanelFaceBore, other: PanelFaceBore, web: number): Fix[] {
  if ((mover.purpose === 'loose' || mover.purpose === 'shelf-pin') && mover.diameter <= site.system.holeDiameter) {
    const holes = clearHoles(site, mover, new Set([mover.id])).slice(0, MAX_CANDIDATES);
    return holes.map((hole) => moveBoreTo(site, mover, hole, ', the nearest clear system hole'));
  }
  // Half-millimetre steps a bench hand can mark; the distance rounded up so the web is met.
  const push = Math.ceil((site.limits.minWeb - web) * 2) / 2;
  const length = Math.hypot(mover.x - other.x, mover.y - other.y);
  if (length === 0) return [];
  const to = { x: mover.x + ((mover.x - other.x) / length) * push, y: mover.y + ((mover.y - other.y) / length) * push };
  return [moveBoreTo(site, mover, to, `, ${site.job.length(push)} further from ${boreName(other)}`)];
}

/** Either bore may be the one to move; both ways are tried, each checked before it is offered. */
function remedyFor(site: PanelSite, a: PanelFaceBore, b: PanelFaceBore, web: number): Remedy {
  return {
    candidates: () => [movesOf(site, b, a, web), movesOf(site, a, b, web)],
    advice: `Move ${moverName(b)} or ${moverName(a)} at least ${site.job.length(site.limits.minWeb - web)} further from the other.`,
  };
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
 * (trade-reference §7: at least 3 mm of board between two bores). Two bores that are one hole are no
 * overlap: one bore is drilled once; whether two fittings may both use it is hole-shared's question.
 */
export function checkBoresOverlap(site: PanelSite): DraftFinding[] {
  const { minWeb } = site.limits;
  const findings: DraftFinding[] = [];
  for (const { a: p, b: q, web } of site.nearPairs) {
    if (p.face !== q.face || isSameHole(p, q) || exempt(site, p, q)) continue;
    const [a, b] = p.id < q.id ? [p, q] : [q, p];
    findings.push(report(site, 'bores-overlap', 'error', describe(site, a, b, web, minWeb, `on face ${a.face}`), [a, b], remedyFor(site, a, b, web)));
  }
  edgePairs(site, (p, q, web) => {
    if (exempt(site, p, q)) return;
    const [a, b] = p.id < q.id ? [p, q] : [q, p];
    const advice = `Move one of them ${site.job.length(minWeb - web)} further from the other along the edge.`;
    findings.push(report(site, 'bores-overlap', 'error', describe(site, a, b, web, minWeb, `in edge ${a.edge}`), [a, b], { advice }));
  });
  return findings;
}
