import { fc, test } from '@fast-check/vitest';
import { describe, expect, it } from 'vitest';
import { formatLength } from './format-length';
import { LENGTH_UNITS, unitStep, type LengthUnit } from './length-unit';
import { parseLength } from './parse-length';

function mmOf(text: string, unit: LengthUnit): number {
  const parsed = parseLength(text, unit);
  if (!parsed.ok) throw new Error(parsed.error);
  return parsed.mm;
}

function errorOf(text: string, unit: LengthUnit): string {
  const parsed = parseLength(text, unit);
  if (parsed.ok) throw new Error(`${text} parsed as ${parsed.mm} mm`);
  return parsed.error;
}

describe('parseLength', () => {
  // 1 in = 25.4 mm exactly (NIST SP 811, appendix B; the 1959 international yard and pound agreement):
  // published. 12 3/8 in = 12.375 in = 12.375 × 25.4 = 314.325 mm.
  it('reads every way of writing 12 3/8 inches as 314.325 mm', () => {
    for (const text of ['12 3/8"', '12-3/8 in', '12 3/8 inches', '12.375"', '12.375 in', ' 12  3/8″ ']) {
      expect(mmOf(text, 'mm'), text).toBe(314.325);
    }
    expect(mmOf('12 3/8', 'in-32')).toBe(314.325);
    expect(mmOf('12.375', 'in')).toBe(314.325);
  });

  it('reads a fraction alone and a negative length', () => {
    expect(mmOf('3/8"', 'mm')).toBe(9.525); // 0.375 × 25.4
    expect(mmOf('-1 1/2"', 'mm')).toBe(-38.1); // 1.5 × 25.4
    expect(mmOf('9/8"', 'mm')).toBe(28.575); // 1.125 × 25.4
  });

  it('reads millimetres with their sign in any unit, and a bare number in the chosen unit', () => {
    expect(mmOf('314.3 mm', 'in-64')).toBe(314.3);
    expect(mmOf('314.3mm', 'mm')).toBe(314.3);
    expect(mmOf('314.3', 'mm')).toBe(314.3);
    expect(mmOf('314.3', 'in')).toBe(7983.22); // 314.3 × 25.4
    expect(mmOf('.5', 'mm')).toBe(0.5);
  });

  it('refuses what is not a length, saying what to type', () => {
    expect(errorOf('', 'mm')).toMatch(/Type a length/);
    expect(errorOf('abc', 'mm')).toMatch(/"abc" is not a length: type e\.g\. 314\.3 mm/);
    expect(errorOf('12 3/8 ft', 'mm')).toMatch(/"ft" is not a unit here/);
    expect(errorOf('314,3', 'mm')).toMatch(/point for decimals/);
    expect(errorOf('3/0"', 'mm')).toMatch(/0 below the line/);
    expect(errorOf('3/8 mm', 'mm')).toMatch(/fraction is read as inches: write 3\/8"/);
    expect(errorOf('3/8', 'mm')).toMatch(/fraction is read as inches/);
    expect(errorOf('12 9/8"', 'mm')).toMatch(/not less than one/);
    expect(errorOf('1e3', 'mm')).toMatch(/"e3" is not a unit here/);
    expect(errorOf('12 3/8" 4', 'mm')).toMatch(/is not a unit here/);
    expect(errorOf('9'.repeat(400), 'mm')).toMatch(/too large/);
  });
});

const units = LENGTH_UNITS;

describe('format then parse', () => {
  // Within half the chosen step: 1/64 in for a 1/32 user, 1/128 in for 1/64, 0.0005 in, 0.005 mm.
  test.prop([fc.double({ min: -5000, max: 5000, noNaN: true }), fc.constantFrom(...units)])('gives back the length within half a step', (mm, unit) => {
    const back = mmOf(formatLength(mm, unit), unit);
    expect(Math.abs(back - mm)).toBeLessThanOrEqual(unitStep(unit) / 2 + 1e-6);
  });

  test.prop([fc.integer({ min: -64 * 200, max: 64 * 200 }), fc.constantFrom<LengthUnit>('in-64', 'in')])(
    'gives back a whole number of 1/64 in exactly, whoever reads it',
    (sixtyFourths, reader) => {
      const mm = (sixtyFourths * 25.4) / 64; // the international inch, 25.4 mm exactly (NIST SP 811): published
      const text = formatLength(mm, 'in-64');
      expect(mmOf(text, reader)).toBeCloseTo(mm, 6);
    },
  );
});
