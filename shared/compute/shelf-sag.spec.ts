import { describe, expect, it } from 'vitest';
import { SHELF_LOAD_BOOKS, SHELF_LOAD_GENERAL, maxShelfSpan, shelfDeflection } from './shelf-sag';

const INCH = 25.4;
/** 1 psi in N/mm²: one pound-force over a square inch. */
const PSI = (0.45359237 * 9.80665) / (INCH * INCH);

describe('shelfDeflection', () => {
  it('fails the worked 800 × 300 × 18 mm MDF shelf', () => {
    // δ = 5wL⁴/(384EI): American Wood Council, Design Aid No. 6, fig. 1 (published); MDF E = 2200 N/mm²:
    // EN 622-5:2009 (published); worked example of trade-reference §5: w = 0.5746 N/mm, δ = 9.55 mm > 5.56 mm.
    expect(SHELF_LOAD_GENERAL * 300).toBeCloseTo(0.5746, 4);
    const sag = shelfDeflection({ span: 800, depth: 300, thickness: 18, modulus: 2200 });
    expect(sag).toBeCloseTo(9.55, 2);
    expect(sag).toBeGreaterThan(800 / 144);
  });
});

describe('maxShelfSpan', () => {
  // AWS maximum spans at 40 / 50 lb/ft², reproduced by the sag formula at L/144 within ±1 in:
  // Architectural Woodwork Standards, 1st ed. (2009), §4.4.14.10.11-13 (published).
  const table = [
    { modulus: 950_000, thickness: 0.75, general: 40, books: 37 },
    { modulus: 950_000, thickness: 1, general: 53, books: 49 },
    { modulus: 1_800_000, thickness: 0.75, general: 49, books: 46 },
    { modulus: 1_800_000, thickness: 1, general: 66, books: 61 },
  ];

  it.each(table)('plywood $modulus psi, $thickness in: $general / $books in', (row) => {
    const shelf = { thickness: row.thickness * INCH, modulus: row.modulus * PSI };
    expect(Math.abs(maxShelfSpan({ ...shelf, load: SHELF_LOAD_GENERAL }) / INCH - row.general)).toBeLessThanOrEqual(1);
    expect(Math.abs(maxShelfSpan({ ...shelf, load: SHELF_LOAD_BOOKS }) / INCH - row.books)).toBeLessThanOrEqual(1);
  });

  it('is the span whose sag is exactly the limit', () => {
    const shelf = { thickness: 19, modulus: 2200 };
    const span = maxShelfSpan(shelf, 240);
    expect(shelfDeflection({ ...shelf, span, depth: 350 })).toBeCloseTo(span / 240, 9);
  });
});
