import { describe, expect, it } from 'vitest';
import { mountingWords, replannableOnScreen } from './carcass-card';

describe('mountingWords', () => {
  it('says what the planner said: a kickboard, a wall, or a carcass drawn by hand standing on the floor', () => {
    expect(mountingWords({ mounting: 'floor', plannedFrom: { mounting: { type: 'kickboard', height: 100, setBack: 50 } } })).toBe('On a kickboard');
    expect(mountingWords({ mounting: 'wall', plannedFrom: { mounting: { type: 'wall' } } })).toBe('Wall-hung');
    expect(mountingWords({ mounting: 'floor' })).toBe('Floor-standing');
    expect(mountingWords({ mounting: 'wall' })).toBe('Wall-hung');
  });

  it('offers planning again on screen for every planned carcass, one in sections too', () => {
    expect(replannableOnScreen({ plannedFrom: { fronts: { type: 'doors' } } })).toBe(true);
    expect(replannableOnScreen({ plannedFrom: { fronts: { type: 'sections', sections: [] } } })).toBe(true);
    expect(replannableOnScreen({})).toBe(false);
  });
});
