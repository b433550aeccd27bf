import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const hole = (id: string, x: number, y: number, more: object = {}) => ({ id, x, y, face: 'A' as const, diameter: 5, depth: 12, ...more });
const overlaps = (bores: object[], placements: object[] = []) =>
  withCode(checkPanels([makePanel('side', { bores: bores as never, placements: placements as never })]), 'bores-overlap');

// minWeb: at least 3 mm of board between two bores on a face (trade-reference §7, common practice).
describe('bores-overlap', () => {
  it('reports two face bores with less than the minimum web between them', () => {
    const [finding] = overlaps([hole('a', 100, 100), hole('b', 106, 100)]);
    expect(finding).toMatchObject({ severity: 'error', panel: 'side', bores: ['a', 'b'] });
    expect(finding.message).toContain('only 1 mm of board');
  });

  it('passes the clean twin with exactly the minimum web', () => {
    expect(overlaps([hole('a', 100, 100), hole('b', 108, 100)])).toEqual([]);
  });

  it('leaves bores on opposite faces and a shared system hole alone', () => {
    expect(overlaps([hole('a', 100, 100), hole('b', 103, 100, { face: 'B' })])).toEqual([]);
    expect(overlaps([hole('row', 37, 105)], [{ id: 'pin', fitting: 'shelf-pin-5', x: 37, y: 105, face: 'A' }])).toEqual([]);
  });

  it('trusts a fitting\'s own spacing: a cup and its fixing holes', () => {
    expect(overlaps([], [{ id: 'h', fitting: 'hinge-full-overlay-45', x: 21.5, y: 100, face: 'A' }])).toEqual([]);
  });

  it('offers the nearest clear system hole for a stray system-size bore', () => {
    const [finding] = overlaps([hole('dowel', 37, 73, { diameter: 8 }), hole('pin', 37, 80)]);
    expect(finding.fixes[0]).toEqual({
      message: 'Move bore pin to x 37, y 105, the nearest clear system hole.',
      edits: [{ kind: 'move-bore', panel: 'side', bore: 'pin', x: 37, y: 105 }],
    });
  });

  it('reports two bores in one edge too close, and not their clean twin', () => {
    const edge = (id: string, at: number) => ({ id, edge: 'y0', at, z: 9, diameter: 8, depth: 21 });
    expect(overlaps([edge('e1', 100), edge('e2', 105)]).map((f) => f.bores)).toEqual([['e1', 'e2']]);
    expect(overlaps([edge('e1', 100), edge('e2', 111)])).toEqual([]);
  });
});
