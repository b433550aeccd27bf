import { describe, expect, it } from 'vitest';
import { planned } from '../testing/planned-carcass';

describe('planDrawers', () => {
  it('cuts equal fronts to half a millimetre and leaves the rest to the top reveal', () => {
    // 722 high, 3 fronts, 3 mm reveals: (722 − 3 × 3) / 3 = 237.67 mm, cut as 237.5 (a saw is set to 0.5 mm at best:
    // common practice); the 0.5 mm left over widens the reveal at the top.
    const plan = planned({ height: 722, fronts: { type: 'drawers', count: 3, reveal: 3 } });
    expect(plan.drawers.map((d) => d.height.value)).toEqual([237.5, 237.5, 237.5]);
  });
});
