import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const dowel = { id: 'dowel', edge: 'y0' as const, at: 37, z: 9, diameter: 8, depth: 21 };
const clash = (bores: object[], placements: object[] = []) =>
  withCode(checkPanels([makePanel('side', { bores: bores as never, placements: placements as never })]), 'edge-bore-clash');

describe('edge-bore-clash', () => {
  it('reports a dowel bore in the lower edge that runs into the first system hole', () => {
    const [finding] = clash([dowel, { id: 'row-0', x: 37, y: 9, face: 'A', diameter: 5, depth: 12 }]);
    expect(finding).toMatchObject({ bores: ['dowel', 'row-0'] });
    expect(finding.message).toBe('Bore dowel (Ø8 × 21 in edge y0) runs into bore row-0 (Ø5 × 12) on face A.');
  });

  it('passes the clean twins: a hole beyond its end, or one too shallow to reach its depth', () => {
    expect(clash([dowel, { id: 'row-1', x: 37, y: 41, face: 'A', diameter: 5, depth: 12 }])).toEqual([]);
    expect(clash([dowel, { id: 'back', x: 37, y: 9, face: 'B', diameter: 5, depth: 5 }])).toEqual([]);
  });

  it('leaves a cam and its own edge bore alone, which are made to meet', () => {
    expect(clash([], [{ id: 'cam', fitting: 'cam-15', x: 100, y: 24, face: 'A' }])).toEqual([]);
  });
});
