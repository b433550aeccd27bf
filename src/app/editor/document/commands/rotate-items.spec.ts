import { describe, expect, it } from 'vitest';
import { selectionOf } from '../selection';
import { sidePanel } from '../testing';
import { rotateItems } from './rotate-items';

describe('rotateItems', () => {
  it('turns selected placements a quarter turn, 270 coming back to 0', () => {
    let panel = sidePanel();
    const selection = selectionOf(['plate-0-1', 'pin-1']);
    panel = rotateItems(panel, { selection });
    expect(panel.placements.map((p) => p.rotation)).toEqual([90, 180]);
    panel = rotateItems(rotateItems(panel, { selection }), { selection });
    expect(panel.placements.map((p) => p.rotation)).toEqual([270, 0]);
  });

  it('keeps unselected placements and the bores as they were', () => {
    const panel = sidePanel();
    const next = rotateItems(panel, { selection: selectionOf(['pin-1'], ['b1']) });
    expect(next.placements[0]).toBe(panel.placements[0]);
    expect(next.bores).toBe(panel.bores);
  });
});
