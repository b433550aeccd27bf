import { describe, expect, it } from 'vitest';
import { selectionOf } from '../selection';
import { sidePanel } from '../testing';
import { moveItems } from './move-items';

describe('moveItems', () => {
  const panel = sidePanel();

  it('moves selected placements and face bores, and an edge bore only along its edge', () => {
    const next = moveItems(panel, { selection: selectionOf(['plate-0-1'], ['b1', 'e1']), dx: 0.1, dy: 0.2 });
    expect(next.placements[0]).toMatchObject({ x: 37.1, y: 105.2 });
    expect(next.placements[1]).toBe(panel.placements[1]);
    expect(next.bores[0]).toMatchObject({ x: 100.1, y: 100.2 });
    expect(next.bores[1]).toMatchObject({ edge: 'x0', at: 200.2 });
  });

  it('keeps the loose bores themselves when only placements move, so a drag of a plate leaves the holes as drawn', () => {
    const next = moveItems(panel, { selection: selectionOf(['plate-0-1']), dx: 0, dy: 32 });
    expect(next.bores).toBe(panel.bores);
    expect(next.placements[0]).toMatchObject({ x: 37, y: 137 });
  });

  it('leaves the panel it was given alone', () => {
    moveItems(panel, { selection: selectionOf(['plate-0-1']), dx: 32, dy: 0 });
    expect(panel.placements[0].x).toBe(37);
  });
});
