import { describe, expect, it } from 'vitest';
import { sidePanel } from '../testing';
import { pasteItems } from './paste-items';

describe('pasteItems', () => {
  it('adds copies moved by the offset under ids free on the panel', () => {
    const panel = sidePanel();
    const clipboard = { placements: [panel.placements[0]], bores: panel.bores };
    const next = pasteItems(panel, { clipboard, offset: { x: 0, y: 32 } });
    expect(next.placements.slice(2).map((p) => [p.id, p.x, p.y])).toEqual([['plate-0-1-2', 37, 137]]);
    expect(next.bores.slice(2)).toEqual([
      { id: 'b1-2', x: 100, y: 132, face: 'A', diameter: 5, depth: 13 },
      { id: 'e1-2', edge: 'x0', at: 232, z: 9, diameter: 8, depth: 30 },
    ]);
  });

  it('keeps ids that are free, as on another panel', () => {
    const source = sidePanel();
    const empty = { ...source, placements: [], bores: [] };
    const next = pasteItems(empty, { clipboard: source, offset: { x: 0, y: 0 } });
    expect(next.placements.map((p) => p.id)).toEqual(['plate-0-1', 'pin-1']);
    expect(next.bores.map((b) => b.id)).toEqual(['b1', 'e1']);
  });
});
