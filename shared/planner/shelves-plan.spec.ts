import { describe, expect, it } from 'vitest';
import { DEFAULT_MATERIALS } from '../model/default-materials';
import { planned } from '../testing/planned-carcass';

const INCH = 25.4;

// AWS maximum span of a ¾ in plywood shelf, 950,000 psi (6.55 GPa), at 40 lb/ft²: 40 in; the sag formula with
// L/144 reproduces it within ±1 in: Architectural Woodwork Standards, 1st ed. (2009), §4.4.14.10.11-13 (published);
// δ = 5wL⁴/(384EI): American Wood Council, Design Aid No. 6 (published).
describe('planShelves: sag against the AWS spans', () => {
  const plywood = { id: 'ply-34', name: 'Plywood ¾ in', thickness: 0.75 * INCH, density: 538, modulus: 6550 };
  const shelfOf = (span: number) => {
    const play = 1;
    const plan = planned({
      material: plywood.id,
      materials: [...DEFAULT_MATERIALS, plywood],
      width: span + 2 * plywood.thickness + 2 * play,
      shelves: { type: 'adjustable', count: 1, play },
    });
    return plan.shelves[0];
  };

  it('passes a 38 in span and fails a 42 in span, the AWS 40 in lying between', () => {
    const short = shelfOf(38 * INCH);
    expect(short.span.value).toBeCloseTo(38 * INCH, 9);
    expect(short.ok).toBe(true);
    expect(shelfOf(42 * INCH).ok).toBe(false);
    expect(Math.abs(short.maxSpan.value / INCH - 40)).toBeLessThanOrEqual(1);
  });

  it('reports the sag, the limit and a note for a shelf that fails', () => {
    const plan = planned({ material: plywood.id, materials: [...DEFAULT_MATERIALS, plywood], width: 1200, shelves: { type: 'fixed', count: 1 } });
    const [shelf] = plan.shelves;
    expect(shelf.limit.value).toBeCloseTo(shelf.span.value / 144, 9);
    expect(shelf.sag.value).toBeGreaterThan(shelf.limit.value);
    expect(plan.notes.some((n) => n.startsWith(`Shelf ${shelf.panel} sags more than the limit`))).toBe(true);
  });
});
