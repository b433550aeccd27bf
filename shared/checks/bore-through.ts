import type { PanelFaceBore } from '../layout/bore';
import type { DraftFinding } from './finding';
import { collect, report, type PanelSite } from './panel-site';
import { boreName, capitalize } from './wording';

function finding(site: PanelSite, bore: PanelFaceBore): DraftFinding | null {
  const { thickness } = site.panel;
  const { minFloor } = site.limits;
  const floor = thickness - bore.depth;
  if (bore.through || floor >= minFloor) return null;
  const message =
    floor <= 0
      ? `${capitalize(boreName(bore))} is ${site.job.length(bore.depth)} deep in a ${site.job.length(thickness)} board: it comes out on the other face.`
      : `${capitalize(boreName(bore))} leaves only ${site.job.length(floor)} under it in a ${site.job.length(thickness)} board; keep at least ${site.job.length(minFloor)}.`;
  const advice = `Drill it at most ${site.job.length(Math.max(thickness - minFloor, 0))} deep, or use a board at least ${site.job.length(bore.depth + minFloor)} thick.`;
  return report(site, 'bore-through', 'error', message, [bore], { advice });
}

/**
 * bore-through: a blind face bore with less than the minimum floor left under it (trade-reference §7: at
 * least 3 mm, so a 13 mm cup needs a 16 mm door). Bores meant to go through are left alone.
 */
export function checkBoreThrough(site: PanelSite): DraftFinding[] {
  return collect(site.faceBores, (b) => finding(site, b));
}
