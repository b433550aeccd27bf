import type { Fitting } from '../catalog/fitting';
import { panelMass } from '../compute/panel-mass';
import { powerFactor } from '../compute/power-factor';
import type { PlacedFitting } from '../layout/panel-layout';
import type { Finding } from './finding';
import { collect, report, type PanelSite } from './panel-site';
import { formatNumber } from './wording';

type Lift = Extract<Fitting, { purpose: 'lift-mechanism' }>;

/** The catalog's lift mechanisms that cover a power factor, for the fix. */
function mechanismsFor(site: PanelSite, pf: number): string[] {
  return [...site.job.catalog.values()]
    .filter((f): f is Lift => f.purpose === 'lift-mechanism' && f.lift.powerFactor.min <= pf && pf <= f.lift.powerFactor.max)
    .map((f) => f.id)
    .sort();
}

function finding(site: PanelSite, placed: PlacedFitting & { fitting: Lift }): Finding | null {
  const id = placed.placement.id;
  const flaps = site.job.flapsOn.get(site.panel.id) ?? [];
  if (flaps.length !== 1) {
    const message =
      flaps.length === 0
        ? `Lift mechanism ${id} sits on a panel that no flap hangs on, so its strength cannot be checked.`
        : `Lift mechanism ${id} sits on a panel that flaps ${flaps.map((f) => f.id).sort().join(', ')} all hang on; its strength cannot be checked against one of them.`;
    const fix = { message: flaps.length === 0 ? "Name this panel in the flap's hang.on." : 'Give each flap panels of its own to hang on.' };
    return report(site, 'lift-out-of-range', 'warning', message, [], fix, [id]);
  }
  const [flap] = flaps;
  const density = site.job.materials.get(flap.material)?.density ?? Number.NaN;
  // The mechanism lifts the flap about its hinge edge, so the flap's width in its frame is its height here.
  const pf = powerFactor({ height: flap.width, mass: panelMass(flap, density), handleMass: flap.handleMass });
  const sharing = Math.max(site.job.liftsFor.get(flap.id) ?? 1, 1);
  const share = pf / sharing;
  const { min, max } = placed.fitting.lift.powerFactor;
  if (share >= min && share <= max) return null;
  const shared = sharing > 1 ? ` shared by ${sharing} mechanisms, ${formatNumber(share)} each` : '';
  const effect = share < min ? 'too strong: it can throw the flap open' : 'too weak: the flap can drop';
  const message = `Lift mechanism ${id} covers power factors ${min} to ${max}, but flap ${flap.id} asks for ${formatNumber(pf)}${shared}: it is ${effect}.`;
  const better = mechanismsFor(site, share);
  const fix = { message: better.length > 0 ? `Use ${better.join(' or ')} instead.` : 'No mechanism in the catalog covers it: change the flap or ask the mechanism maker.' };
  return report(site, 'lift-out-of-range', 'error', message, [], fix, [id]);
}

/**
 * lift-out-of-range: a lift mechanism on a side acts on the flap that hangs on that side (its `hang.on`);
 * the flap's power factor, PF = flap height × (flap mass + 2 × handle mass) (trade-reference §3), shared
 * equally by the mechanisms on the panels it hangs on, must fall within the mechanism's range.
 */
export function checkLiftOutOfRange(site: PanelSite): Finding[] {
  const lifts = site.layout.placed.filter((p): p is PlacedFitting & { fitting: Lift } => p.fitting.purpose === 'lift-mechanism');
  return collect(lifts, (p) => finding(site, p));
}
