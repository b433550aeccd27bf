import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel, type PanelInput } from '../testing/make-job';

// A 716 mm door hanging 2 mm up its side: a cup at door height c meets a plate at side height c + 2 (design.md §3).
// Plates anchored at 9 + 16 + 32k put both their holes on the system holes of an 18 mm carcass.
const side = (plates: number[]): PanelInput =>
  makePanel('left', { placements: plates.map((y, i) => ({ id: `plate-${i + 1}`, fitting: 'plate-0', x: 37, y, face: 'A' })) });
const door = (cups: number[]): PanelInput =>
  makePanel('door', {
    role: 'door',
    width: 496,
    height: 716,
    hang: { on: ['left'], dy: 2 },
    placements: cups.map((y, i) => ({ id: `hinge-${i + 1}`, fitting: 'hinge-full-overlay-45', x: 21.5, y, face: 'A' })),
  });
const endDistance = (...panels: PanelInput[]) => withCode(checkPanels(panels), 'hinge-end-distance');

// The outer cup centres sit 76 to 100 mm from the door's top and bottom (trade-reference §2, common practice).
describe('hinge-end-distance', () => {
  it('warns of a cup 55 mm from the door\'s end, and moves it with its plate one pitch up', () => {
    const [finding] = endDistance(side([57, 633]), door([55, 631]));
    expect(finding).toMatchObject({ severity: 'warning', panel: 'door', placements: ['hinge-1'] });
    expect(finding.message).toBe("Hinge hinge-1's cup is 55 mm from the end at y = 0 of door door; the outer cups sit 76 to 100 mm from the ends.");
    // 55 + 32 = 87: in range, and the plate goes from 57 to 89, still on system holes, still facing its cup.
    expect(finding.fixes.map((f) => f.edits)).toEqual([
      [
        { kind: 'move-placement', panel: 'door', placement: 'hinge-1', x: 21.5, y: 87 },
        { kind: 'move-placement', panel: 'left', placement: 'plate-1', x: 37, y: 89 },
      ],
    ]);
  });

  it('warns of a cup 60 mm from the far end, and passes the clean twin at 85', () => {
    // 716 − 656 = 60 mm from the top.
    expect(endDistance(side([89, 658]), door([87, 656])).map((f) => f.placements)).toEqual([['hinge-2']]);
    expect(endDistance(side([89, 633]), door([87, 631]))).toEqual([]);
  });

  it('accepts both ends of the range, 76 and 100 mm, and warns at 75 and 101', () => {
    const at = (bottom: number) => endDistance(side([633]), door([bottom, 631])).length;
    expect([at(76), at(100), at(75), at(101)]).toEqual([0, 0, 1, 1]);
  });

  it('leaves a single hinge to hinge-count and a side\'s placements alone', () => {
    expect(endDistance(side([42]), door([40]))).toEqual([]);
    expect(endDistance(makePanel('left', { placements: [60, 631].map((y, i) => ({ id: `h${i}`, fitting: 'hinge-full-overlay-45', x: 21.5, y, face: 'A' })) }))).toEqual([]);
  });
});
