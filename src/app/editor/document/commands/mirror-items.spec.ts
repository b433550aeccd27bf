import { describe, expect, it } from 'vitest';
import { selectionOf } from '../selection';
import { sidePanel } from '../testing';
import { mirrorItems } from './mirror-items';

describe('mirrorItems', () => {
  it('mirrors a placement, and mirroring again gives the same data back', () => {
    const panel = sidePanel();
    const selection = selectionOf(['plate-0-1']);
    const once = mirrorItems(panel, { selection });
    expect(once.placements[0].mirrored).toBe(true);
    expect(once.placements[1]).toBe(panel.placements[1]);
    expect(mirrorItems(once, { selection }).placements[0]).toEqual(panel.placements[0]);
  });
});
