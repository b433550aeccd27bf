import type { FittingPurpose } from '../catalog/fitting';
import { isSameHole, type PanelFaceBore } from '../layout/bore';
import type { DraftFinding } from './finding';
import { pitchMoves } from './fix-moves';
import { report, type PanelSite } from './panel-site';
import { formatNumber, placementName } from './wording';

/** Which fitting of a shared hole to offer to move first: a shelf pin moves most easily, a hinge's plate least. */
const MOVE_FIRST: readonly FittingPurpose[] = ['shelf-pin', 'construction', 'runner', 'lift-mechanism', 'mounting-plate', 'hinge-cup'];

/** The holes of a panel that bores of two or more placements need, each as the bores that meet there. */
function sharedHoles(site: PanelSite): PanelFaceBore[][] {
  const holes = new Map<string, Set<PanelFaceBore>>();
  for (const { a, b } of site.nearPairs) {
    // A loose bore is a line-bored system hole that only locates: a fitting going into it is what it is for.
    if (a.placement === undefined || b.placement === undefined || a.placement === b.placement || !isSameHole(a, b)) continue;
    const key = `${a.face} ${Math.round(a.x * 10)} ${Math.round(a.y * 10)} ${a.diameter}`;
    const bores = holes.get(key) ?? new Set();
    holes.set(key, bores.add(a).add(b));
  }
  return [...holes.values()].map((bores) => [...bores]);
}

function rank(bore: PanelFaceBore): number {
  const i = MOVE_FIRST.indexOf(bore.purpose as FittingPurpose);
  return i < 0 ? MOVE_FIRST.length : i;
}

function finding(site: PanelSite, bores: PanelFaceBore[]): DraftFinding {
  const [hole] = bores;
  const names = bores.flatMap((b) => site.layout.placed.filter((p) => p.placement.id === b.placement).map(placementName));
  const message = `The hole at x ${site.job.coordinate(hole.x)}, y ${site.job.coordinate(hole.y)} on face ${hole.face} (Ø${formatNumber(hole.diameter)}) is needed by ${names.join(' and ')}: one hole carries one fitting.`;
  const movers = [...bores].sort((a, b) => rank(a) - rank(b) || (a.placement! < b.placement! ? -1 : 1)).slice(0, 2);
  return report(site, 'hole-shared', 'error', message, bores, {
    candidates: () => movers.map((b) => pitchMoves(site, b)),
    advice: `Decide which fitting keeps the hole and move the other to a hole of its own.`,
  });
}

/**
 * hole-shared: a hole that two placements both need, a pin in a plate's screw hole, two pins in one hole,
 * a pin on a cam bolt's hole. Each puts something into the hole, and a hole carries one fitting
 * (trade-reference §8a, common practice): an error. The trade shares a hole on purpose only with line boring:
 * a loose system hole drilled along the row locates the plate screw or pin that goes into it, so a loose bore
 * and one fitting are one hole drilled once, never a finding. A fitting's own bores are never shared holes.
 */
export function checkHoleShared(site: PanelSite): DraftFinding[] {
  return sharedHoles(site).map((bores) => finding(site, bores));
}
