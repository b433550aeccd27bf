import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { exportJob } from '../testing/export-job';
import { makePanel } from '../testing/make-job';
import { CAUTIONS, cautionsFor, TIP_OVER_HEIGHT } from './cautions';

const ids = (job: Parameters<typeof cautionsFor>[0]) => cautionsFor(job, builtinCatalog()).map((c) => c.id);
const carcass = (fields: object) => ({ id: 'base', name: 'Unit', width: 600, height: 720, depth: 300, material: 'pb18', ...fields });

describe('cautionsFor', () => {
  it('always warns about drilling from printed templates', () => {
    expect(ids(exportJob({ carcasses: [carcass({ height: 400 })] }))).toEqual(['drilling']);
    expect(CAUTIONS.drilling).toBe('Drilling from printed templates: check the 100 mm bar on every page before drilling; eye and hearing protection at the machine.');
  });

  it('warns about wall fixings where a unit hangs on the wall', () => {
    expect(ids(exportJob({ carcasses: [carcass({ mounting: 'wall' })] }))).toContain('wall-hung');
    expect(ids(exportJob({ carcasses: [carcass({ mounting: 'floor', height: 400 })] }))).not.toContain('wall-hung');
  });

  it('warns about spring-loaded mechanisms where a flap or a lift mechanism is planned', () => {
    const lift = makePanel('side', { placements: [{ id: 'l', fitting: 'lift-medium', x: 37, y: 300, face: 'A' }] });
    expect(ids(exportJob({}, [lift]))).toContain('lift-mechanism');
    expect(ids(exportJob({}, [makePanel('flap', { role: 'flap' })]))).toContain('lift-mechanism');
    expect(ids(exportJob())).not.toContain('lift-mechanism');
  });

  it('warns that a floor unit of 27 in (686 mm) and up can tip', () => {
    // 16 CFR 1261 (2023) covers clothing storage units of 27 in and up (trade-reference §9, published).
    expect(TIP_OVER_HEIGHT).toBe(Math.round(27 * 25.4));
    expect(ids(exportJob({ carcasses: [carcass({ height: 686 })] }))).toContain('tall-unit');
    expect(ids(exportJob({ carcasses: [carcass({ height: 685 })] }))).not.toContain('tall-unit');
  });
});
