import { pairKey } from '../layout/panel-layout';
import type { DraftFinding } from './finding';
import { report, type PanelSite } from './panel-site';
import { boreName, capitalize } from './wording';

/**
 * faces-clash: a bore on face A and one on face B that overlap in plan and together go so deep that less
 * than the minimum floor is left between them (a through bore counts as the whole board).
 */
export function checkFacesClash(site: PanelSite): DraftFinding[] {
  const { thickness } = site.panel;
  const { minFloor } = site.limits;
  const findings: DraftFinding[] = [];
  for (const { a: p, b: q, web } of site.nearPairs) {
    // Bores on opposite faces meet only where they overlap in plan.
    if (web >= 0 || p.face === q.face || site.layout.joined.has(pairKey(p.id, q.id))) continue;
    const left = thickness - p.depth - q.depth;
    if (left >= minFloor) continue;
    const [a, b] = p.face === 'A' ? [p, q] : [q, p];
    const between = left <= 0 ? 'no board between them: they meet inside it' : `only ${site.job.length(left)} of board between them`;
    const message = `${capitalize(boreName(a))} on face A and ${boreName(b)} on face B overlap in plan and leave ${between} (${site.job.length(thickness)} board; keep at least ${site.job.length(minFloor)}).`;
    const advice = `Move one clear of the other in plan, or drill them at most ${site.job.length(Math.max(thickness - minFloor, 0))} deep together.`;
    findings.push(report(site, 'faces-clash', 'error', message, [a, b], { advice }));
  }
  return findings;
}
