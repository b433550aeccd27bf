import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const through = (panel: Parameters<typeof makePanel>[1]) => withCode(checkPanels([makePanel('p', panel)]), 'bore-through');
const cup = [{ id: 'h', fitting: 'hinge-full-overlay-45', x: 21.5, y: 100, face: 'A' as const }];

// minFloor: at least 3 mm under a blind bore; a 13 mm cup in a 16 mm door leaves 3 (trade-reference §7, common practice).
describe('bore-through', () => {
  it('reports a 13 mm cup in a 12 mm door, which comes out on the front', () => {
    const [finding] = through({ role: 'door', thickness: 12, placements: cup });
    expect(finding).toMatchObject({ bores: ['h/cup'], placements: ['h'] });
    expect(finding.message).toBe('Bore h/cup (Ø35 × 13) is 13 mm deep in a 12 mm board: it comes out on the other face.');
  });

  it('passes the clean twin: the same cup in a 16 mm door leaves 3 mm', () => {
    expect(through({ role: 'door', thickness: 16, placements: cup })).toEqual([]);
  });

  it('reports a blind bore that leaves 2 mm, and leaves a through bore alone', () => {
    const bore = (depth: number) => [{ id: 'b', x: 100, y: 100, face: 'A' as const, diameter: 5, depth }];
    expect(through({ bores: bore(16) })[0].message).toContain('leaves only 2 mm under it');
    expect(through({ bores: bore(18) })).toEqual([]);
    expect(through({ placements: [{ id: 's', fitting: 'connector-screw-7-face', x: 100, y: 9, face: 'A' }] })).toEqual([]);
  });
});
