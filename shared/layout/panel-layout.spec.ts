import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { makeJob, makePanel } from '../testing/make-job';
import { layoutPanel, pairKey, panelBores } from './panel-layout';

describe('layoutPanel', () => {
  const job = makeJob([
    makePanel('bottom', {
      role: 'bottom',
      bores: [{ id: 'loose-1', x: 100, y: 100, face: 'A', diameter: 5, depth: 18 }],
      placements: [
        { id: 'c1', fitting: 'cam-15', x: 37, y: 24, face: 'A' },
        { id: 'x1', fitting: 'no-such-fitting', x: 37, y: 200, face: 'A' },
      ],
    }),
  ]);
  const layout = layoutPanel(job.panels[0], builtinCatalog(), job.system);

  it('lists loose bores and then expanded placements', () => {
    expect(layout.bores.map((b) => b.id)).toEqual(['loose-1', 'c1/cam', 'c1/bolt']);
    expect(panelBores(job.panels[0], builtinCatalog(), job.system)).toEqual(layout.bores);
    expect(layout.bores[0]).toMatchObject({ purpose: 'loose', through: true });
  });

  it('sets aside a placement whose fitting is not in the catalog', () => {
    expect(layout.unknown.map((p) => p.id)).toEqual(['x1']);
    expect(layout.placed.map((p) => p.placement.id)).toEqual(['c1']);
  });

  it('knows which bores a fitting is made to join', () => {
    expect(layout.joined.has(pairKey('c1/bolt', 'c1/cam'))).toBe(true);
    expect(layout.joined.has(pairKey('c1/cam', 'loose-1'))).toBe(false);
  });
});
