import { describe, expect, it } from 'vitest';
import { dimensionTexts } from './paint-overlay';

// Konva cannot draw in jsdom (no canvas): tests/e2e/units.e2e.ts reads the labels painted on a real stage.
describe("the stage's dimensions in the member's units", () => {
  it('write the selection’s position in mm or inches; the document keeps mm', () => {
    // 12 3/8 in = 314.325 mm; 23 mm = 0.9055 in = 28.98/32 → 29/32 (the international inch, 25.4 mm: NIST SP 811, published).
    expect(dimensionTexts({ x: 23, y: 314.325 }, 'mm')).toEqual({ x: 'x 23 mm', y: 'y 314.33 mm' });
    expect(dimensionTexts({ x: 23, y: 314.325 }, 'in-32')).toEqual({ x: 'x 29/32"', y: 'y 12 3/8"' });
    // 0.9055 in to the thousandth; 37 mm = 1.4567 in = 93.23/64 → 1 29/64.
    expect(dimensionTexts({ x: 23, y: 37 }, 'in')).toEqual({ x: 'x 0.906"', y: 'y 1.457"' });
    expect(dimensionTexts({ x: 23, y: 37 }, 'in-64')).toEqual({ x: 'x 29/32"', y: 'y 1 29/64"' });
  });
});
