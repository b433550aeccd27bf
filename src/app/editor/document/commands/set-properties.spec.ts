import { describe, expect, it } from 'vitest';
import { sidePanel } from '../testing';
import { setProperties } from './set-properties';

describe('setProperties', () => {
  it('changes the named placement only', () => {
    const panel = sidePanel();
    const next = setProperties(panel, { id: 'pin-1', changes: { x: 491, face: 'B', params: { boringDistance: 4 } } });
    expect(next.placements[1]).toMatchObject({ id: 'pin-1', x: 491, y: 329, face: 'B', rotation: 90, params: { boringDistance: 4 } });
    expect(next.placements[0]).toBe(panel.placements[0]);
  });
});
