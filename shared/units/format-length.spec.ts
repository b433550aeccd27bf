import { describe, expect, it } from 'vitest';
import { formatLength, formatSystemLength } from './format-length';

describe('formatLength', () => {
  it('prints millimetres to 0.01 mm without trailing zeros', () => {
    expect(formatLength(314.325, 'mm')).toBe('314.33 mm');
    expect(formatLength(37, 'mm')).toBe('37 mm');
    expect(formatLength(-9.5, 'mm')).toBe('-9.5 mm');
  });

  // The international inch is exactly 25.4 mm (NIST SP 811, appendix B; the 1959 international yard and
  // pound agreement): published.
  it('prints one international inch for 25.4 mm in every inch form', () => {
    expect(formatLength(25.4, 'in')).toBe('1"');
    expect(formatLength(25.4, 'in-32')).toBe('1"');
    expect(formatLength(25.4, 'in-64')).toBe('1"');
    expect(formatLength(914.4, 'in')).toBe('36"'); // one yard, 0.9144 m exactly (same agreement)
  });

  it('prints decimal inches to 0.001 in', () => {
    expect(formatLength(314.325, 'in')).toBe('12.375"');
    expect(formatLength(32, 'in')).toBe('1.26"'); // 32 / 25.4 = 1.25984…
  });

  it('prints fractional inches reduced, with whole inches apart', () => {
    expect(formatLength(314.325, 'in-32')).toBe('12 3/8"'); // 12.375 in = 12 12/32 = 12 3/8
    expect(formatLength(9.525, 'in-64')).toBe('3/8"'); // 0.375 in
    expect(formatLength(304.8, 'in-32')).toBe('12"'); // one foot, 0.3048 m exactly
    expect(formatLength(0.1, 'in-32')).toBe('0"');
  });

  it('rounds to the nearest step, halves away from zero, so a negative length mirrors the positive one', () => {
    // 32 mm = 1.259842… in = 80.63/64 → 81/64 = 1 17/64; to 1/32 it is 40.31/32 → 40/32 = 1 1/4.
    expect(formatLength(32, 'in-64')).toBe('1 17/64"');
    expect(formatLength(32, 'in-32')).toBe('1 1/4"');
    expect(formatLength(-32, 'in-64')).toBe('-1 17/64"');
    expect(formatLength(-9.525, 'in-32')).toBe('-3/8"');
    // exactly half a 1/32 (1/64 in = 0.396875 mm) rounds up to 1/32 and down to -1/32
    expect(formatLength(25.4 / 64, 'in-32')).toBe('1/32"');
    expect(formatLength(-25.4 / 64, 'in-32')).toBe('-1/32"');
  });

  it('says nothing numeric for a length that is not finite', () => {
    expect(formatLength(Number.NaN, 'in-32')).toBe('–');
  });
});

describe('formatSystemLength', () => {
  it("keeps the 32 mm system's own figures in mm and adds inches for an inch user", () => {
    expect(formatSystemLength(32, 'mm')).toBe('32 mm');
    expect(formatSystemLength(32, 'in-32')).toBe('32 mm (1 17/64")');
    expect(formatSystemLength(32, 'in-64')).toBe('32 mm (1 17/64")');
    expect(formatSystemLength(37, 'in')).toBe('37 mm (1.457")');
  });
});
