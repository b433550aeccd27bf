import { describe, expect, it } from 'vitest';
import { sidePanel } from '../testing';
import { addPlacement } from './add-placement';

describe('addPlacement', () => {
  it('numbers the new placement after its fitting, past the numbers already used', () => {
    const next = addPlacement(sidePanel(), { fitting: 'plate-0', x: 37, y: 233, face: 'B' });
    expect(next.placements.at(-1)).toEqual({ id: 'plate-0-2', fitting: 'plate-0', x: 37, y: 233, face: 'B', rotation: 0 });
    const again = addPlacement(next, { fitting: 'hinge-full-overlay-45', x: 21.5, y: 100, face: 'A' });
    expect(again.placements.at(-1)?.id).toBe('hinge-full-overlay-45-1');
  });
});
