import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../../shared/catalog/builtin-catalog';
import { layoutPanel } from '../../../../shared/layout/panel-layout';
import { makeJob, makePanel } from '../../../../shared/testing/make-job';
import { HitIndex, hitItems } from './hit-index';

describe('HitIndex', () => {
  const job = makeJob([
    makePanel('left', {
      placements: [
        { id: 'plate', fitting: 'plate-0', x: 37, y: 121, face: 'A' },
        { id: 'lost', fitting: 'gone-fitting', x: 300, y: 300, face: 'A' },
      ],
      bores: [{ id: 'b1', x: 37, y: 121, face: 'B', diameter: 5, depth: 13 }],
    }),
  ]);
  const panel = job.panels[0];
  const layout = layoutPanel(panel, builtinCatalog(), job.system);
  const index = new HitIndex(hitItems(panel, layout));

  it("gives a selection's items as the whole list has them", () => {
    const all = hitItems(panel, layout);
    expect(hitItems(panel, layout, { placements: new Set(['plate']), bores: new Set(['b1']) })).toEqual(all.filter((h) => h.id !== 'lost'));
    expect(hitItems(panel, layout, { placements: new Set(['lost']), bores: new Set() })).toEqual(all.filter((h) => h.id === 'lost'));
  });

  it('picks the item on the face shown before one on the other face', () => {
    expect(index.pick(37, 121, 1, 'A')?.id).toBe('plate');
    expect(index.pick(37, 121, 1, 'B')?.id).toBe('b1');
  });

  it('takes hold of a placement whose fitting is missing by its placeholder', () => {
    expect(index.pick(305, 295, 0, 'A')).toMatchObject({ kind: 'placement', id: 'lost' });
    expect(index.pick(200, 200, 1, 'A')).toBeUndefined();
  });

  it('box-selects only what lies wholly inside', () => {
    expect(index.inside(0, 0, 100, 200).map((h) => h.id).sort()).toEqual(['b1', 'plate']);
    expect(index.inside(0, 0, 100, 125).map((h) => h.id)).toEqual(['b1']);
  });
});
