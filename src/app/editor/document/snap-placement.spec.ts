import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../../shared/catalog/builtin-catalog';
import { systemGrid } from '../../../../shared/grid/system-grid';
import { snapPlacement } from './snap-placement';

const catalog = builtinCatalog();
const system = { pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 };
const grid = systemGrid({ width: 560, height: 720 }, 18, system);
const upright = { rotation: 0 as const, face: 'A' as const };

describe('snapPlacement', () => {
  it('puts a mounting plate\'s holes on system holes of the nearest row', () => {
    // Holes at y ± 16, rows start at 9: the lower hole goes to 105, so the anchor to 121.
    expect(snapPlacement({ x: 45, y: 118 }, upright, catalog.get('plate-0'), { grid, step: 1, free: false })).toEqual({ x: 37, y: 121 });
    expect(snapPlacement({ x: 500, y: 118 }, upright, catalog.get('plate-0'), { grid, step: 1, free: false }).x).toBe(grid.rows[1]);
  });

  it('lets a runner screw into any grid column between the rows', () => {
    expect(snapPlacement({ x: 100, y: 50 }, upright, catalog.get('runner-500'), { grid, step: 1, free: false })).toEqual({ x: 101, y: 41 });
  });

  it('puts other fittings on the step, and Alt lets anything go free', () => {
    const hinge = catalog.get('hinge-full-overlay-45');
    expect(snapPlacement({ x: 21.4, y: 99.6 }, upright, hinge, { grid, step: 1, free: false })).toEqual({ x: 21, y: 100 });
    expect(snapPlacement({ x: 21.4, y: 99.6 }, upright, hinge, { grid, step: 0.5, free: false })).toEqual({ x: 21.5, y: 99.5 });
    expect(snapPlacement({ x: 45.25, y: 118.25 }, upright, catalog.get('plate-0'), { grid, step: 1, free: true })).toEqual({ x: 45.25, y: 118.25 });
  });
});
