import { describe, expect, it } from 'vitest';
import { hingesNeeded } from './hinge-count';

// Up to 900 mm and 6 kg: 2; to 1600 / 12: 3; to 2000 / 17: 4; to 2400 / 22: 5 (trade-reference §2, common practice).
describe('hingesNeeded', () => {
  it('follows the height and the mass, whichever asks for more', () => {
    expect(hingesNeeded(720, 4)).toBe(2);
    expect(hingesNeeded(900, 6)).toBe(2);
    expect(hingesNeeded(901, 4)).toBe(3);
    expect(hingesNeeded(720, 13)).toBe(4);
    expect(hingesNeeded(2400, 22)).toBe(5);
  });

  it('leaves a door beyond the rule to the hinge maker', () => {
    expect(hingesNeeded(2401, 10)).toBeNull();
    expect(hingesNeeded(800, 30)).toBeNull();
    expect(hingesNeeded(Number.NaN, 5)).toBeNull();
  });
});
