import type { Catalog, Fitting } from '../catalog/fitting';
import { powerFactor, powerFactorAgainstRange, rangeForWords, type FlapLoad } from '../compute/power-factor';
import { explain, type Explained } from './explained';

export type LiftFitting = Extract<Fitting, { purpose: 'lift-mechanism' }>;

/** The mechanism chosen for a flap, with the power factor it answers. */
export interface LiftChoice {
  fitting: LiftFitting;
  powerFactor: Explained;
  /** The share each mechanism carries when there are two. */
  perMechanism: Explained;
}

const round = (value: number) => Math.round(value * 10) / 10;

/**
 * Chooses a lift mechanism for a flap: PF = flap height × (flap mass + 2 × handle mass) (trade-reference §3,
 * common practice), shared equally by the mechanisms as the lift-out-of-range check shares it. Of the
 * mechanisms whose range covers the share, the one whose range has most room around it, so the spring can
 * be set either way. When none covers it, the error says by how much and what would.
 */
export function chooseLift(catalog: Catalog, flap: FlapLoad, mechanisms: number): LiftChoice | { error: string } {
  const pf = powerFactor(flap);
  const share = pf / mechanisms;
  const lifts = [...catalog.values()].filter((f): f is LiftFitting => f.purpose === 'lift-mechanism');
  // Each fitting's range is read as it is printed, for each mechanism or for a pair, as the check reads it.
  const asked = (f: LiftFitting) => powerFactorAgainstRange(pf, mechanisms, f.lift.rangeFor);
  const margin = (f: LiftFitting) => Math.min(asked(f) - f.lift.powerFactor.min, f.lift.powerFactor.max - asked(f));
  const covering = lifts.filter((f) => margin(f) >= 0).sort((a, b) => margin(b) - margin(a));
  const handle = flap.handleMass ? ` + 2 × ${flap.handleMass} kg handle` : '';
  const pfWhy = `flap height ${round(flap.height)} mm × (${round(flap.mass)} kg flap${handle})`;
  const shared = mechanisms > 1 ? `, ${round(share)} for each of ${mechanisms} mechanisms` : '';
  if (covering.length === 0) {
    if (lifts.length === 0) return { error: 'fronts: the catalog has no lift mechanism; import one from the mechanism maker\'s data' };
    // What one mechanism carries: a range printed for a pair is twice what each of the two holds.
    const each = (f: LiftFitting, v: number) => (f.lift.rangeFor === 'pair' ? v / 2 : v);
    const strongest = Math.max(...lifts.map((f) => each(f, f.lift.powerFactor.max)));
    const weakest = Math.min(...lifts.map((f) => each(f, f.lift.powerFactor.min)));
    const heavy = share > strongest;
    const limit = ((heavy ? strongest : weakest) * mechanisms) / flap.height - 2 * (flap.handleMass ?? 0);
    const more = heavy && mechanisms === 1 && share / 2 <= strongest ? '; two mechanisms, one on each side, would carry it' : '';
    const what = heavy
      ? `too heavy for every mechanism of the catalog (the strongest goes to ${strongest}): a flap of at most ${round(limit)} kg at this height would do${more}`
      : `too light for every mechanism of the catalog (the weakest starts at ${weakest}) and would be thrown open: a flap of at least ${round(limit)} kg at this height would do${mechanisms === 2 ? ', or a single mechanism' : ''}`;
    return { error: `fronts: the flap asks for a power factor of ${round(pf)} (${pfWhy})${shared}; it is ${what}, or a mechanism for ${round(share)} from the maker's range` };
  }
  const [fitting] = covering;
  return {
    fitting,
    powerFactor: explain(pf, `PF = ${pfWhy}`),
    perMechanism: explain(share, `${mechanisms > 1 ? `shared equally by ${mechanisms} mechanisms` : 'one mechanism'}; ${fitting.name} covers ${fitting.lift.powerFactor.min} to ${fitting.lift.powerFactor.max} ${rangeForWords(fitting.lift.rangeFor)}`),
  };
}
