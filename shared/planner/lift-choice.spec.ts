import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { chooseLift } from './lift-choice';
import { planned } from '../testing/planned-carcass';

// PF = flap height × (flap mass + 2 × handle mass) (trade-reference §3, common practice). Worked example of
// trade-reference §3: H = 400 mm, m = 5 kg gives PF 2000; with a 0.3 kg handle PF 2240, M_max = 10.98 N·m
// (M(θ) from Hibbeler, Engineering Mechanics: Statics, 14th ed. (2016), §4.1, published, from memory).
// The built-in ranges: light 500 to 1300, medium 1200 to 2400, strong 2200 to 4000.
describe('chooseLift', () => {
  const flap = { height: 400, mass: 5 };

  it('chooses the medium mechanism for PF 2000 on one mechanism', () => {
    const choice = chooseLift(builtinCatalog(), flap, 1);
    expect('fitting' in choice && [choice.fitting.id, choice.powerFactor.value]).toEqual(['lift-medium', 2000]);
  });

  it('with the 0.3 kg handle, PF 2240: medium, which has more room around it than strong', () => {
    const choice = chooseLift(builtinCatalog(), { ...flap, handleMass: 0.3 }, 1);
    expect('fitting' in choice && choice.fitting.id).toBe('lift-medium');
    expect('fitting' in choice && choice.powerFactor.value).toBeCloseTo(2240, 9);
  });

  it('shares the load between two mechanisms: 1000 each takes the light one', () => {
    const choice = chooseLift(builtinCatalog(), flap, 2);
    expect('fitting' in choice && [choice.fitting.id, choice.perMechanism.value]).toEqual(['lift-light', 1000]);
  });

  it('refuses a flap too heavy for every mechanism and says what would do', () => {
    // 400 mm × 12 kg = PF 4800 > 4000; the strongest carries 4000 / 400 = 10 kg at this height.
    const refusal = chooseLift(builtinCatalog(), { height: 400, mass: 12 }, 1);
    expect(refusal).toEqual({
      error:
        "fronts: the flap asks for a power factor of 4800 (flap height 400 mm × (12 kg flap)); it is too heavy for every mechanism of the catalog (the strongest goes to 4000): a flap of at most 10 kg at this height would do; two mechanisms, one on each side, would carry it, or a mechanism for 4800 from the maker's range",
    });
  });
});

describe('planFlap', () => {
  it('gives the flap its power factor, mechanism and moment curve', () => {
    // Wall carcass 600 × 723 of 19 mm MDF at 700 kg/m³ (EN 622-5), reveal 3: the flap is 720 mm from hinge edge to
    // free edge and 597 mm long: 720 × 597 × 19 × 700e-9 = 5.717 kg; with a 0.3 kg handle PF = 720 × (5.717 + 0.6)
    // = 4548; two mechanisms carry 2274 each, within medium (1200 to 2400) and strong (2200 to 4000): medium has
    // more room. M_max = PF·g/2000 = 22.30 N·m.
    const { flap } = planned({ fronts: { type: 'flap', reveal: 3, handleMass: 0.3 } });
    expect(flap?.height.value).toBe(720);
    expect(flap?.mass.value).toBeCloseTo(5.717 + 0.3, 3);
    expect(flap?.lift.powerFactor.value).toBeCloseTo(4548, 0);
    expect(flap?.lift.fitting.id).toBe('lift-medium');
    expect(flap?.mechanisms.map((m) => m.side)).toEqual(['wall-left', 'wall-right']);
    expect(flap?.maxMoment.value).toBeCloseTo(22.3, 2);
    expect(flap?.moment.at(-1)?.angle).toBe(90);
    expect(flap?.moment.at(-1)?.moment).toBeCloseTo(flap?.maxMoment.value ?? 0, 9);
    expect(flap?.moment[0]).toEqual({ angle: 0, moment: 0 });
  });
});
