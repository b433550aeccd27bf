import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../../shared/catalog/builtin-catalog';
import { makeJob, makePanel } from '../../../../shared/testing/make-job';
import { hingeCupX, hingeCupWhy, syncBoringDistances } from './hinge-distance';

const catalog = builtinCatalog();
const hinge = catalog.get('hinge-full-overlay-45');

// trade-reference §2: the cup centre lies B + 17.5 mm from the door edge for a Ø35 cup (common practice);
// this hinge allows B from 3 to 7 mm (its catalog entry).
describe('a hinge cup across the door', () => {
  it('keeps a cup whose cup-boring distance the hinge allows, and says why it stands there', () => {
    expect(hingeCupX(22, { rotation: 0 }, hinge)).toEqual({ x: 22, why: expect.stringContaining('cup-boring distance 4.5 mm plus half the Ø35 cup') });
    expect(hingeCupX(21, { rotation: 0 }, hinge).x).toBe(21);
  });

  it('moves a cup dropped too near or too far from the hinge edge to the nearest B the hinge takes', () => {
    expect(hingeCupX(12, { rotation: 0 }, hinge).x).toBe(20.5); // B 3
    expect(hingeCupX(40, { rotation: 0 }, hinge).x).toBe(24.5); // B 7
    expect(hingeCupX(40, { rotation: 90 }, hinge)).toEqual({ x: 40 });
    expect(hingeCupX(40, { rotation: 0 }, catalog.get('plate-0'))).toEqual({ x: 40 });
  });

  it('fills the cup-boring distance from x on every unturned cup, and leaves a planned one as it was', () => {
    const door = makeJob([
      makePanel('door', {
        role: 'door',
        placements: [
          { id: 'dropped', fitting: 'hinge-full-overlay-45', x: 21, y: 100, face: 'A' },
          { id: 'planned', fitting: 'hinge-full-overlay-45', x: 22, y: 600, face: 'A', params: { boringDistance: 4.5 } },
        ],
      }),
    ]).panels[0];
    const synced = syncBoringDistances(door, catalog);
    expect(synced.placements.map((p) => p.params?.['boringDistance'])).toEqual([3.5, 4.5]);
    expect(syncBoringDistances(synced, catalog)).toBe(synced);
    expect(hingeCupWhy(synced.placements[0], hinge)).toMatch(/^Cup centre 21 mm from the hinge edge/);
  });

  it("says why in the member's units, the cup's diameter the bit's in mm", () => {
    const cup = makeJob([makePanel('door', { role: 'door', placements: [{ id: 'h', fitting: 'hinge-full-overlay-45', x: 22, y: 100, face: 'A' }] })]).panels[0].placements[0];
    // The international inch is 25.4 mm (NIST SP 811, published): 22 mm = 0.8661 in = 27.72/32 → 7/8; B 4.5 mm = 5.67/32 → 3/16;
    // the hinge's 3 to 7 mm: 3.78/32 → 1/8 and 8.82/32 → 9/32.
    expect(hingeCupWhy(cup, hinge, 'in-32')).toBe('Cup centre 7/8" from the hinge edge: cup-boring distance 3/16" plus half the Ø35 cup; this hinge takes 1/8" to 9/32".');
    expect(hingeCupWhy(cup, hinge)).toBe('Cup centre 22 mm from the hinge edge: cup-boring distance 4.5 mm plus half the Ø35 cup; this hinge takes 3 to 7 mm.');
  });
});
