import { describe, expect, it } from 'vitest';
import { isOnGrid, nearestGridPoint, snapToSystemHole } from './snap';
import { systemGrid } from './system-grid';

const system = { pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 };
const grid = systemGrid({ width: 350, height: 592 }, 16, system);

describe('snapToSystemHole', () => {
  it('moves a point to the nearest hole of the nearest row', () => {
    expect(snapToSystemHole(grid, { x: 50, y: 100 })).toEqual({ x: 37, y: 104 });
    expect(snapToSystemHole(grid, { x: 300, y: -40 })).toEqual({ x: grid.rows[1], y: 8 });
    expect(snapToSystemHole(grid, { x: 37, y: 10_000 })).toEqual({ x: 37, y: grid.lastY });
  });

  it('has nothing to snap to on a panel too small for a row', () => {
    expect(snapToSystemHole(systemGrid({ width: 20, height: 500 }, 16, system), { x: 5, y: 5 })).toBeNull();
  });
});

describe('nearestGridPoint and isOnGrid', () => {
  it('use every column a whole number of pitches behind the front row', () => {
    expect(nearestGridPoint(grid, { x: 70, y: 90 })).toEqual({ x: 69, y: 104 });
    expect(isOnGrid(grid, { x: 69, y: 104 })).toBe(true);
    expect(isOnGrid(grid, { x: 69.5, y: 104 })).toBe(false);
    expect(isOnGrid(grid, { x: 37, y: 88 })).toBe(false);
    expect(isOnGrid(grid, { x: 5, y: 8 })).toBe(false);
  });

  it('are not fooled by NaN', () => {
    expect(isOnGrid(grid, { x: Number.NaN, y: 8 })).toBe(false);
  });
});
