import { describe, expect, it } from 'vitest';
import { selectionOf } from '../selection';
import { sidePanel } from '../testing';
import { repeatAlongRow } from './repeat-along-row';

describe('repeatAlongRow', () => {
  it('adds copies one step apart up the row, each with its own id', () => {
    const next = repeatAlongRow(sidePanel(), { selection: selectionOf(['pin-1']), count: 3, step: 32 });
    const pins = next.placements.filter((p) => p.fitting === 'shelf-pin-5');
    expect(pins.map((p) => [p.x, p.y, p.rotation])).toEqual([
      [37, 329, 90],
      [37, 361, 90],
      [37, 393, 90],
      [37, 425, 90],
    ]);
    expect(new Set(pins.map((p) => p.id)).size).toBe(4);
  });

  it('runs down the row with a negative step', () => {
    const next = repeatAlongRow(sidePanel(), { selection: selectionOf(['plate-0-1']), count: 1, step: -64 });
    expect(next.placements.at(-1)).toMatchObject({ fitting: 'plate-0', y: 41 });
  });
});
