import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const shelf = (height: number) => makePanel('shelf', { role: 'shelf', width: 300, height, thickness: 18, material: 'mdf18' });

describe('shelf-sag', () => {
  it('reports the worked 800 × 300 × 18 mm MDF shelf: 9.55 mm against L/144 = 5.56 mm', () => {
    // Worked example of trade-reference §5 (5wL⁴/384EI: American Wood Council, Design Aid No. 6, published;
    // 40 lb/ft² and L/144: AWS 1st ed. (2009) §1.2.21, published; MDF E = 2200: EN 622-5:2009, published).
    const [finding] = withCode(checkPanels([shelf(800)]), 'shelf-sag');
    expect(finding).toMatchObject({ severity: 'warning', panel: 'shelf' });
    expect(finding.message).toContain('sags 9.6 mm');
    expect(finding.message).toContain('L/144 = 5.6 mm');
  });

  it('passes the clean twin of 600 mm span', () => {
    expect(withCode(checkPanels([shelf(600)]), 'shelf-sag')).toEqual([]);
  });

  it('follows the shop\'s stricter limit', () => {
    // L/240, which some panel makers use (trade-reference §5, common practice).
    const limits = { minWeb: 3, minEdge: 3, minFloor: 3, sagRatio: 240 };
    expect(withCode(checkPanels([shelf(600)], { limits }), 'shelf-sag')).toHaveLength(1);
  });
});
