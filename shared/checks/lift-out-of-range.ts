import type { Fitting } from '../catalog/fitting';
import type { Panel } from '../model/job-document';
import { panelMass } from '../compute/panel-mass';
import { powerFactor, powerFactorAgainstRange, rangeForWords } from '../compute/power-factor';
import type { PlacedFitting } from '../layout/panel-layout';
import type { DraftFinding, Fix } from './finding';
import { collect, report, type PanelSite } from './panel-site';
import { formatNumber } from './wording';

type Lift = Extract<Fitting, { purpose: 'lift-mechanism' }>;

/** Whether a mechanism's range covers a flap's power factor shared by `count` mechanisms. */
function covers(lift: Lift, pf: number, count: number): boolean {
  const asked = powerFactorAgainstRange(pf, count, lift.lift.rangeFor);
  return lift.lift.powerFactor.min <= asked && asked <= lift.lift.powerFactor.max;
}

/** The fixes that give every mechanism on the flap's panels another fitting of the catalog that covers it. */
function replacements(site: PanelSite, flap: Panel, pf: number, count: number): Fix[] {
  const lifts = [...site.job.catalog.values()].filter((f): f is Lift => f.purpose === 'lift-mechanism' && covers(f, pf, count));
  const placed = (flap.hang?.on ?? []).flatMap((id) => {
    const panel = site.job.panels.get(id);
    return (panel?.placements ?? []).filter((p) => site.job.catalog.get(p.fitting)?.purpose === 'lift-mechanism').map((p) => ({ panel: id, placement: p.id }));
  });
  return lifts
    .sort((a, b) => (a.id < b.id ? -1 : 1))
    .map((f) => ({
      message: `Use ${f.id} (${f.name}) for ${placed.length > 1 ? `all ${placed.length} mechanisms of flap ${flap.id}` : `flap ${flap.id}`}.`,
      edits: placed.map((p) => ({ kind: 'set-fitting' as const, ...p, fitting: f.id })),
    }));
}

function finding(site: PanelSite, placed: PlacedFitting & { fitting: Lift }): DraftFinding | null {
  const id = placed.placement.id;
  const flaps = site.job.flapsOn.get(site.panel.id) ?? [];
  if (flaps.length !== 1) {
    const message =
      flaps.length === 0
        ? `Lift mechanism ${id} sits on a panel that no flap hangs on, so its strength cannot be checked.`
        : `Lift mechanism ${id} sits on a panel that flaps ${flaps.map((f) => f.id).sort().join(', ')} all hang on; its strength cannot be checked against one of them.`;
    const advice = flaps.length === 0 ? "Name this panel in the flap's hang.on." : 'Give each flap panels of its own to hang on.';
    return report(site, 'lift-out-of-range', 'warning', message, [], { advice }, [id]);
  }
  const [flap] = flaps;
  const density = site.job.materials.get(flap.material)?.density ?? Number.NaN;
  // The mechanism lifts the flap about its hinge edge, so the flap's width in its frame is its height here.
  const pf = powerFactor({ height: flap.width, mass: panelMass(flap, density), handleMass: flap.handleMass });
  const sharing = Math.max(site.job.liftsFor.get(flap.id) ?? 1, 1);
  const { powerFactor: range, rangeFor } = placed.fitting.lift;
  const asked = powerFactorAgainstRange(pf, sharing, rangeFor);
  if (asked >= range.min && asked <= range.max) return null;
  const shared = sharing > 1 ? ` shared by ${sharing} mechanisms` : '';
  const against = asked === pf ? '' : `, ${formatNumber(asked)} against a range ${rangeForWords(rangeFor)}`;
  const effect = asked < range.min ? 'too strong: it can throw the flap open' : 'too weak: the flap can drop';
  const message = `Lift mechanism ${id} covers power factors ${range.min} to ${range.max} ${rangeForWords(rangeFor)}, but flap ${flap.id} asks for ${formatNumber(pf)}${shared}${against}: it is ${effect}.`;
  const advice = 'No mechanism in the catalog covers it: change the flap or ask the mechanism maker.';
  const remedy = { candidates: () => [replacements(site, flap, pf, sharing)], advice };
  return report(site, 'lift-out-of-range', 'error', message, [], remedy, [id]);
}

/**
 * lift-out-of-range: a lift mechanism on a side acts on the flap that hangs on that side (its `hang.on`);
 * the flap's power factor, PF = flap height × (flap mass + 2 × handle mass) (trade-reference §3), shared
 * equally by the mechanisms on the panels it hangs on, must fall within the mechanism's range, read for each
 * mechanism or for a pair as the fitting says (trade-reference §8a).
 */
export function checkLiftOutOfRange(site: PanelSite): DraftFinding[] {
  const lifts = site.layout.placed.filter((p): p is PlacedFitting & { fitting: Lift } => p.fitting.purpose === 'lift-mechanism');
  return collect(lifts, (p) => finding(site, p));
}
