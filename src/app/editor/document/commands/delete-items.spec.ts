import { describe, expect, it } from 'vitest';
import { selectionOf } from '../selection';
import { sidePanel } from '../testing';
import { deleteItems } from './delete-items';

describe('deleteItems', () => {
  it('removes the selected placements and loose bores only', () => {
    const next = deleteItems(sidePanel(), { selection: selectionOf(['pin-1'], ['e1']) });
    expect(next.placements.map((p) => p.id)).toEqual(['plate-0-1']);
    expect(next.bores.map((b) => b.id)).toEqual(['b1']);
  });
});
