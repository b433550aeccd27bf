import { fc, test } from '@fast-check/vitest';
import { describe, expect } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { makeJob, makePanel } from '../testing/make-job';
import type { PanelBore } from './bore';
import { panelBores } from './panel-layout';
import { reflectDrilling, type ReflectAxis } from './reflect';

const catalog = builtinCatalog();
const fittingIds = [...catalog.keys()];
const coordinate = fc.integer({ min: 0, max: 2000 }).map((v) => v / 4);

const placement = fc.record({
  fitting: fc.constantFrom(...fittingIds),
  x: coordinate,
  y: coordinate,
  face: fc.constantFrom('A' as const, 'B' as const),
  rotation: fc.constantFrom(0 as const, 90 as const, 180 as const, 270 as const),
  mirrored: fc.boolean(),
});
const faceBore = fc.record({ x: coordinate, y: coordinate, face: fc.constantFrom('A' as const, 'B' as const), diameter: fc.constantFrom(5, 8, 35), depth: fc.constantFrom(10, 13) });
const edgeBore = fc.record({ edge: fc.constantFrom('x0' as const, 'x1' as const, 'y0' as const, 'y1' as const), at: coordinate, z: fc.constantFrom(5, 9), diameter: fc.constantFrom(5, 8), depth: fc.constantFrom(21, 30) });

const panelArb = fc
  .record({ placements: fc.array(placement, { maxLength: 6 }), bores: fc.array(fc.oneof(faceBore, edgeBore), { maxLength: 6 }) })
  .map(({ placements, bores }) =>
    makeJob([
      makePanel('p', {
        width: 500,
        height: 600,
        placements: placements.map((p, i) => ({ ...p, id: `pl${i}` })),
        bores: bores.map((b, i) => ({ ...b, id: `b${i}` })),
      }),
    ]),
  );

/** The reflection of one drilled bore, as the geometry says it must be. */
function reflected(b: PanelBore, axis: ReflectAxis): PanelBore {
  const size = { x: 500, y: 600 }[axis];
  if (b.kind === 'face') return axis === 'x' ? { ...b, x: size - b.x } : { ...b, y: size - b.y };
  const across = (b.edge[0] === 'x') === (axis === 'x');
  const flip = { x0: 'x1', x1: 'x0', y0: 'y1', y1: 'y0' } as const;
  return across ? { ...b, edge: flip[b.edge] } : { ...b, at: size - b.at };
}

const byId = (a: PanelBore, b: PanelBore) => (a.id < b.id ? -1 : 1);

describe('reflectDrilling', () => {
  test.prop([panelArb, fc.constantFrom<ReflectAxis>('x', 'y')])('mirroring twice changes nothing', (job, axis) => {
    const panel = job.panels[0];
    expect(reflectDrilling(reflectDrilling(panel, axis), axis)).toEqual(panel);
  });

  test.prop([panelArb, fc.constantFrom<ReflectAxis>('x', 'y')])('drills the mirror image of every bore', (job, axis) => {
    const panel = job.panels[0];
    const mirrored = panelBores(reflectDrilling(panel, axis), catalog, job.system).sort(byId);
    const expected = panelBores(panel, catalog, job.system).map((b) => reflected(b, axis)).sort(byId);
    expect(mirrored).toEqual(expected);
  });
});
