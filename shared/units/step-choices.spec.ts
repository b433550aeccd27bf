import { describe, expect, it } from 'vitest';
import { formatLength } from './format-length';
import { stepChoices, usualStep } from './step-choices';

// The international inch is exactly 25.4 mm (NIST SP 811, the 1959 international yard and pound agreement: published).
describe("the editor's steps in the reader's units", () => {
  it('offers round millimetres to a metric reader, 1 mm to start with', () => {
    expect(stepChoices('mm')).toEqual([0.1, 0.5, 1, 5, 10]);
    expect(usualStep('mm')).toBe(1);
  });

  it('offers the marks of an inch rule to an inch reader, each an exact number of mm', () => {
    // 1/32 in = 25.4 / 32 = 0.79375 mm; 1/16 in = 1.5875 mm; 1/8 in = 3.175 mm; 1/4 in = 6.35 mm; 1/2 in = 12.7 mm.
    expect(stepChoices('in-32')).toEqual([0.79375, 1.5875, 3.175, 6.35, 12.7]);
    // 1/64 in = 0.396875 mm.
    expect(stepChoices('in-64')[0]).toBe(0.396875);
    expect(usualStep('in-32')).toBe(1.5875);
    expect(stepChoices('in-32').map((mm) => formatLength(mm, 'in-32'))).toEqual(['1/32"', '1/16"', '1/8"', '1/4"', '1/2"']);
    // 0.01 in = 0.254 mm and 0.25 in = 6.35 mm, read back as the decimal inches they are.
    expect(stepChoices('in').map((mm) => formatLength(mm, 'in'))).toEqual(['0.01"', '0.05"', '0.1"', '0.25"', '0.5"']);
    expect(stepChoices('in')[0]).toBeCloseTo(0.254, 12);
  });
});
