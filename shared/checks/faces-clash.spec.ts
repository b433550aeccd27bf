import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const hole = (id: string, x: number, face: 'A' | 'B', depth: number) => ({ id, x, y: 100, face, diameter: 5, depth });
const clash = (bores: object[]) => withCode(checkPanels([makePanel('p', { bores: bores as never })]), 'faces-clash');

// minFloor: at least 3 mm of board left between bores (trade-reference §7, common practice).
describe('faces-clash', () => {
  it('reports bores from both faces that overlap in plan and meet inside an 18 mm board', () => {
    const [finding] = clash([hole('b', 102, 'B', 10), hole('a', 100, 'A', 10)]);
    expect(finding).toMatchObject({ severity: 'error', bores: ['a', 'b'] });
    expect(finding.message).toContain('Bore a (Ø5 × 10) on face A and bore b (Ø5 × 10) on face B');
    expect(finding.message).toContain('they meet inside it');
  });

  it('passes the clean twins: clear in plan, or shallow enough', () => {
    expect(clash([hole('a', 100, 'A', 10), hole('b', 106, 'B', 10)])).toEqual([]);
    expect(clash([hole('a', 100, 'A', 7), hole('b', 102, 'B', 8)])).toEqual([]);
  });
});
