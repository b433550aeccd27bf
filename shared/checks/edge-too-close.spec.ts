import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const near = (bores: object[], placements: object[] = []) =>
  withCode(checkPanels([makePanel('side', { bores: bores as never, placements: placements as never })]), 'edge-too-close');
const hole = (x: number, diameter = 5) => ({ id: 'b', x, y: 300, face: 'A', diameter, depth: 10 });

// minEdge: bore edge to panel edge at least 3 mm, a dowel at least one radius (trade-reference §7, common practice;
// dowels one radius from the edge: WOODWEB Knowledge Base, "Dowel drilling and use guidelines" (published)).
describe('edge-too-close', () => {
  it('reports a bore 2 mm from the reference edge and says where to move it', () => {
    const [finding] = near([hole(4.5)]);
    expect(finding.message).toBe('Bore b (Ø5 × 10) is 2 mm from the reference edge; keep at least 3 mm.');
    expect(finding.fixes.map((f) => f.edits)).toEqual([[{ kind: 'move-bore', panel: 'side', bore: 'b', x: 5.5, y: 300 }]]);
  });

  it('passes the clean twin 3 mm from the edge', () => {
    expect(near([hole(5.5)])).toEqual([]);
  });

  it('keeps a dowel at least one radius from the edge, moving its placement', () => {
    const dowel = (x: number) => [{ id: 'd', fitting: 'dowel-8x30-face', x, y: 300, face: 'A' }];
    const [finding] = near([], dowel(7));
    expect(finding.placements).toEqual(['d']);
    expect(finding.fixes.map((f) => f.edits)).toEqual([[{ kind: 'move-placement', panel: 'side', placement: 'd', x: 8, y: 300 }]]);
    expect(near([], dowel(8))).toEqual([]);
  });

  it('reports an edge bore too near a face, and not one at mid-thickness', () => {
    const edge = (z: number) => ({ id: 'e', edge: 'y0', at: 200, z, diameter: 8, depth: 21 });
    expect(near([edge(5)])[0].message).toContain('leaves 1 mm of board to face A');
    expect(near([edge(9)])).toEqual([]);
  });
});
