import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { checkPanels, withCode } from '../testing/check-panels';
import { makeJob, makePanel } from '../testing/make-job';
import { checkPanel } from './index';

const outside = (panel: Parameters<typeof makePanel>[1]) => withCode(checkPanels([makePanel('p', panel)]), 'outside-panel');

describe('outside-panel', () => {
  it('reports a bore that reaches past an edge, and not its clean twin on the edge line', () => {
    const hole = (x: number) => [{ id: 'b', x, y: 300, face: 'A' as const, diameter: 5, depth: 10 }];
    expect(outside({ bores: hole(1) })[0].message).toBe('Bore b (Ø5 × 10) reaches 1.5 mm past the reference edge.');
    expect(outside({ bores: hole(2.5) })).toEqual([]);
  });

  it('names a placement put off the panel once, with all its bores', () => {
    const [finding] = outside({ placements: [{ id: 'pl', fitting: 'plate-0', x: -100, y: -100, face: 'A' }] });
    expect(finding).toMatchObject({ placements: ['pl'], bores: ['pl/hole-1', 'pl/hole-2'] });
    expect(finding.message).toContain('lies off the panel');
  });

  it('reports a bore larger than its panel and an edge bore that runs through', () => {
    const big = outside({ width: 50, height: 50, bores: [{ id: 'big', x: 25, y: 25, face: 'A', diameter: 100, depth: 5 }] });
    expect(big.map((f) => f.bores)).toEqual([['big']]);
    const long = outside({ bores: [{ id: 'e', edge: 'y0', at: 100, z: 9, diameter: 8, depth: 800 }] });
    expect(long[0].message).toContain('runs right through to the opposite edge');
  });

  it('reports NaN numbers and a panel of no size without crashing', () => {
    // The schema refuses such documents; the checks must still survive them when handed one directly.
    const job = makeJob([makePanel('p')]);
    const nanBore = { ...job.panels[0], bores: [{ id: 'n', x: Number.NaN, y: 5, face: 'A' as const, diameter: 5, depth: 10 }] };
    expect(checkPanel(job, nanBore, builtinCatalog()).map((f) => [f.code, f.bores])).toEqual([['outside-panel', ['n']]]);
    const flat = { ...job.panels[0], width: 0, placements: [{ id: 'pl', fitting: 'plate-0', x: 37, y: 105, face: 'A' as const, rotation: 0 as const }] };
    const [finding, ...rest] = checkPanel(job, flat, builtinCatalog());
    expect(rest).toEqual([]);
    expect(finding).toMatchObject({ code: 'outside-panel', placements: ['pl'] });
    expect(finding.message).toContain('has no drillable size');
  });
});
