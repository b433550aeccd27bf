import { fc, test } from '@fast-check/vitest';
import { describe, expect, it } from 'vitest';
import { flapMoment, maxFlapMoment, powerFactor } from './power-factor';

// M(θ) = m·g·(H/2)·sin θ + m_h·g·H·sin θ, M_max = PF·g/2000:
// Hibbeler, Engineering Mechanics: Statics, 14th ed. (2016), §4.1 (published, from memory);
// worked example of trade-reference §3: H = 400 mm, m = 5 kg.
describe('flap moment', () => {
  const flap = { height: 400, mass: 5 };

  it('reproduces the worked example without a handle', () => {
    expect(powerFactor(flap)).toBe(2000);
    expect(flapMoment(flap, 90)).toBeCloseTo(9.807, 3);
    expect(flapMoment(flap, 45)).toBeCloseTo(6.934, 3);
    expect(flapMoment(flap, 0)).toBe(0);
  });

  it('reproduces the worked example with a 0.3 kg handle', () => {
    const withHandle = { ...flap, handleMass: 0.3 };
    expect(powerFactor(withHandle)).toBeCloseTo(2240, 9);
    expect(flapMoment(withHandle, 90)).toBeCloseTo(10.98, 2);
  });

  test.prop([
    fc.double({ min: 50, max: 1500, noNaN: true }),
    fc.double({ min: 0.1, max: 40, noNaN: true }),
    fc.double({ min: 0, max: 3, noNaN: true }),
  ])('PF·g/2000 equals the statics formula with the flap level', (height, mass, handleMass) => {
    const load = { height, mass, handleMass };
    expect(maxFlapMoment(powerFactor(load))).toBeCloseTo(flapMoment(load, 90), 9);
  });
});
