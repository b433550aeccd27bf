import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

describe('unknown-fitting', () => {
  it('names a placement whose fitting is not in the catalog and goes on checking the rest', () => {
    const findings = checkPanels([
      makePanel('side', {
        placements: [{ id: 'x', fitting: 'brand-new-thing', x: 37, y: 105, face: 'A' }],
        bores: [{ id: 'b', x: 1, y: 300, face: 'A', diameter: 5, depth: 10 }],
      }),
    ]);
    expect(withCode(findings, 'unknown-fitting')).toEqual([
      expect.objectContaining({ placements: ['x'], bores: [], panel: 'side', severity: 'error' }),
    ]);
    expect(withCode(findings, 'outside-panel')).toHaveLength(1);
  });

  it('passes the clean twin with a catalog fitting', () => {
    const findings = checkPanels([makePanel('side', { placements: [{ id: 'x', fitting: 'shelf-pin-5', x: 37, y: 105, face: 'A' }] })]);
    expect(findings).toEqual([]);
  });
});
