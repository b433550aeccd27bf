import { describe, expect, it } from 'vitest';
import { holeHeights, systemGrid } from './system-grid';

const system = { pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 };

describe('systemGrid', () => {
  it('puts the front row at the setback and the rear row a whole number of pitches behind it', () => {
    // Front row 37 mm from the front edge, rear row a multiple of 32 mm behind it:
    // Wikipedia, "32 mm cabinetmaking system" (published).
    const grid = systemGrid({ width: 560, height: 720 }, 19, system);
    expect(grid.rows[0]).toBe(37);
    expect((grid.rows[1] - grid.rows[0]) % 32).toBe(0);
    // The rear row keeps at least the setback to the back edge, and one more pitch would not.
    expect(560 - grid.rows[1]).toBeGreaterThanOrEqual(37);
    expect(560 - (grid.rows[1] + 32)).toBeLessThan(37);
  });

  it('starts the holes at half the adjoining board and ends them as far below the top on a balanced side', () => {
    // T = 19, n = 66 gives H = 2131 mm, holes at 9.5 + 32k, the last 9.5 mm below the top:
    // WOODWEB Knowledge Base, "Panel and Door Balancing with 32mm Systems" (published).
    const grid = systemGrid({ width: 560, height: 2131 }, 19, system);
    const ys = holeHeights(grid);
    expect(ys[0]).toBe(9.5);
    expect(ys).toHaveLength(67);
    expect(ys.every((y, k) => y === 9.5 + 32 * k)).toBe(true);
    expect(2131 - ys[ys.length - 1]).toBe(9.5);
  });

  it('gives a narrow panel only the front row and a tiny one none', () => {
    expect(systemGrid({ width: 80, height: 300 }, 19, system).rows).toEqual([37]);
    const tiny = systemGrid({ width: 20, height: 10 }, 19, system);
    expect(tiny.rows).toEqual([]);
    expect(holeHeights(tiny)).toEqual([]);
  });
});
