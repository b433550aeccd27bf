import { describe, expect, it } from 'vitest';
import { isBalancedHeight, nearestBalancedHeights } from './balanced-height';

// H = 32·n + T is balanced; T = 19, n = 66 gives 2131 mm:
// WOODWEB Knowledge Base, "Panel and Door Balancing with 32mm Systems" (published).
describe('isBalancedHeight', () => {
  it('accepts 32·66 + 19 = 2131 and refuses a millimetre either side', () => {
    expect(isBalancedHeight(2131, 19)).toBe(true);
    expect(isBalancedHeight(2130, 19)).toBe(false);
    expect(isBalancedHeight(2132, 19)).toBe(false);
  });

  it('refuses a height of no whole pitch and nonsense', () => {
    expect(isBalancedHeight(19, 19)).toBe(false);
    expect(isBalancedHeight(Number.NaN, 19)).toBe(false);
  });
});

describe('nearestBalancedHeights', () => {
  it('gives the balanced heights on either side', () => {
    expect(nearestBalancedHeights(2140, 19)).toEqual({ below: 2131, above: 2163 });
    expect(nearestBalancedHeights(2131, 19)).toEqual({ below: 2131, above: 2131 });
    expect(nearestBalancedHeights(30, 19)).toEqual({ below: null, above: 51 });
  });
});
