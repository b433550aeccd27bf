import { describe, expect, it } from 'vitest';
import { PAPER, templateWindow } from './paper';
import { planTiles, TILE_OVERLAP, tileName, type TilePlan } from './tiles';

/** Checks that the tiles cover [0, width] × [0, height] and that neighbours share exactly TILE_OVERLAP. */
function expectCover(plan: TilePlan, width: number, height: number): void {
  const at = (row: number, col: number) => plan.tiles[row * plan.cols + col].area;
  for (let row = 0; row < plan.rows; row++) {
    for (let col = 0; col < plan.cols; col++) {
      const a = at(row, col);
      if (col + 1 < plan.cols) expect(a.x + a.width - at(row, col + 1).x).toBeCloseTo(TILE_OVERLAP, 9);
      if (row + 1 < plan.rows) expect(a.y + a.height - at(row + 1, col).y).toBeCloseTo(TILE_OVERLAP, 9);
    }
  }
  expect(at(0, 0)).toMatchObject({ x: 0, y: 0 });
  const last = at(plan.rows - 1, plan.cols - 1);
  expect(last.x + last.width).toBeGreaterThanOrEqual(width);
  expect(last.y + last.height).toBeGreaterThanOrEqual(height);
}

describe('planTiles', () => {
  it('covers a map with every neighbour overlapping by the stated strip, on A4 and US Letter', () => {
    for (const paper of ['a4', 'letter'] as const) {
      const plan = planTiles(620, 880, paper);
      expectCover(plan, 620, 880);
      // A4 is 210 × 297 mm (ISO 216); US Letter 215.9 × 279.4 mm (ANSI/ASME Y14.1, from memory).
      const { width, height } = PAPER[paper];
      expect([plan.pageWidth, plan.pageHeight].sort()).toEqual([width, height].sort());
    }
  });

  it('tiles a panel larger than any sheet: 2800 × 1200', () => {
    const plan = planTiles(2800, 1200, 'a4');
    expectCover(plan, 2800, 1200);
    expect(plan.tiles.length).toBe(plan.rows * plan.cols);
  });

  it('takes the orientation that needs fewer pages', () => {
    // A long flat map lies better across landscape pages: count the columns each way.
    const columns = (pageWidth: number, pageHeight: number) => Math.ceil((1000 - TILE_OVERLAP) / (templateWindow(pageWidth, pageHeight).width - TILE_OVERLAP));
    const plan = planTiles(1000, 150, 'a4');
    expect(columns(297, 210)).toBeLessThan(columns(210, 297));
    expect(plan.orientation).toBe('landscape');
    expect(plan.tiles).toHaveLength(columns(297, 210));
    expect(planTiles(150, 1000, 'a4').orientation).toBe('portrait');
  });

  it('puts a small map on one page', () => {
    expect(planTiles(100, 100, 'letter').tiles).toHaveLength(1);
  });
});

describe('tileName', () => {
  it('names rows by letter and columns by number, past Z as AA', () => {
    expect(tileName(0, 0)).toBe('A1');
    expect(tileName(1, 2)).toBe('B3');
    expect(tileName(26, 0)).toBe('AA1');
  });
});
