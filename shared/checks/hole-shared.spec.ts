import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const shared = (placements: object[], bores: object[] = []) =>
  withCode(checkPanels([makePanel('side', { placements: placements as never, bores: bores as never })]), 'hole-shared');
const pin = (id: string, y: number, x = 37) => ({ id, fitting: 'shelf-pin-5', x, y, face: 'A' });
// A plate anchored at 105 has its screw holes at 89 and 121: system holes of an 18 mm carcass (9 + 32k).
const plate = { id: 'plate', fitting: 'plate-0', x: 37, y: 105, face: 'A' };

// One hole carries one fitting: a pin, a plate screw, a cam bolt or a dowel each needs its hole to itself
// (trade-reference §8a, common practice).
describe('hole-shared', () => {
  it('reports a shelf pin in a mounting plate\'s screw hole, naming both fittings and the hole', () => {
    const [finding] = shared([plate, pin('pin', 121)]);
    expect(finding).toMatchObject({ severity: 'error', bores: ['pin/pin', 'plate/hole-2'], placements: ['pin', 'plate'] });
    expect(finding.message).toBe(
      'The hole at x 37, y 121 on face A (Ø5) is needed by placement plate (Mounting plate, 0 mm) and placement pin (Shelf pin, Ø5): one hole carries one fitting.',
    );
    // The pin moves first, to the nearest hole of its own that the checks found clear: one pitch up, 153.
    expect(finding.fixes[0].edits).toEqual([{ kind: 'move-placement', panel: 'side', placement: 'pin', x: 37, y: 153 }]);
  });

  it('reports two shelf pins in one hole, and passes a pin one pitch away', () => {
    expect(shared([pin('a', 329), pin('b', 329)])).toHaveLength(1);
    expect(shared([pin('a', 329), pin('b', 361)])).toEqual([]);
    expect(shared([plate, pin('pin', 153)])).toEqual([]);
  });

  it('reports a pin dropped on a cam bolt\'s hole', () => {
    expect(shared([{ id: 'bolt', fitting: 'cam-bolt', x: 37, y: 329, face: 'A' }, pin('pin', 329)])).toHaveLength(1);
  });

  it('leaves line boring alone: a loose system hole locates the one fitting that goes into it', () => {
    // A plate screw in a line-bored system hole is the system's purpose (trade-reference §8a, common practice).
    const row = [89, 121].map((y, i) => ({ id: `row-${i}`, x: 37, y, face: 'A', diameter: 5, depth: 13 }));
    expect(shared([plate], row)).toEqual([]);
    expect(shared([plate, pin('pin', 121)], row)).toHaveLength(1);
  });

  it('does not count a fitting\'s own bores, nor holes on opposite faces', () => {
    expect(shared([{ id: 'h', fitting: 'hinge-full-overlay-45', x: 21.5, y: 100, face: 'A' }])).toEqual([]);
    expect(shared([pin('a', 329), { ...pin('b', 329), face: 'B' }])).toEqual([]);
  });

  it('offers no fix that leads into another shared hole', () => {
    // Pins fill the holes above and below: the nearest free hole is two pitches away, and a fix that put the
    // pin onto a neighbour would raise hole-shared again, so it is never offered.
    const [finding] = shared([pin('a', 329), pin('b', 329), pin('up', 361), pin('down', 297)]);
    const moves = finding.fixes.flatMap((f) => f.edits);
    expect(moves.length).toBeGreaterThan(0);
    for (const m of moves) expect(m.kind === 'move-placement' && [297, 329, 361].includes(m.y)).toBe(false);
  });
});
