import { fc, test } from '@fast-check/vitest';
import { describe, expect, it } from 'vitest';
import { distinctValues, spreadLabels } from './ordinates';

describe('distinctValues', () => {
  it('writes equal dimensions once, sorted, equal to 0.01 mm', () => {
    expect(distinctValues([37, 9.5, 37, 37.001, 261, 9.5])).toEqual([9.5, 37, 261]);
  });

  it('leaves out values that are not numbers', () => {
    expect(distinctValues([1, Number.NaN, Infinity])).toEqual([1]);
  });
});

describe('spreadLabels', () => {
  it('keeps labels at their positions when there is room', () => {
    expect(spreadLabels([0, 10, 50], 3)).toEqual([0, 10, 50]);
  });

  it('centres a crowded run on its positions', () => {
    // Two labels 1 mm apart that need 3 mm: each moves 1 mm away from their middle.
    expect(spreadLabels([10, 11], 3)).toEqual([9, 12]);
  });

  test.prop([fc.array(fc.double({ min: -1000, max: 1000, noNaN: true }), { maxLength: 40 }), fc.double({ min: 0.5, max: 10, noNaN: true })])(
    'keeps the order and at least the spacing between any two labels',
    (values, spacing) => {
      const positions = [...values].sort((a, b) => a - b);
      const placed = spreadLabels(positions, spacing);
      expect(placed).toHaveLength(positions.length);
      for (let i = 1; i < placed.length; i++) expect(placed[i] - placed[i - 1]).toBeGreaterThanOrEqual(spacing - 1e-6);
    },
  );

  test.prop([fc.array(fc.double({ min: -1000, max: 1000, noNaN: true }), { minLength: 1, maxLength: 40 })])(
    'moves a run no further than it must: its mean stays on the mean of its positions',
    (values) => {
      const positions = [...values].sort((a, b) => a - b);
      const placed = spreadLabels(positions, 3);
      const mean = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
      // Least squares in runs keeps each run's mean, hence the whole list's.
      expect(mean(placed)).toBeCloseTo(mean(positions), 6);
    },
  );
});
