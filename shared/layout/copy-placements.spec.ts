import { describe, expect, it } from 'vitest';
import { makeJob, makePanel } from '../testing/make-job';
import { copyPlacements } from './copy-placements';

describe('copyPlacements', () => {
  const job = makeJob([
    makePanel('a', {
      placements: [
        { id: 'pin', fitting: 'shelf-pin-5', x: 37, y: 73, face: 'A' },
        { id: 'pin-2', fitting: 'shelf-pin-5', x: 37, y: 105, face: 'A' },
      ],
    }),
    makePanel('b', { placements: [{ id: 'pin', fitting: 'shelf-pin-5', x: 293, y: 73, face: 'A' }] }),
  ]);
  const [a, b] = job.panels;

  it('moves copies by the offset and gives each an id free on the target', () => {
    const result = copyPlacements(a.placements, b, { x: 0, y: 64 });
    expect(result.placements.map((p) => [p.id, p.x, p.y])).toEqual([
      ['pin', 293, 73],
      ['pin-2', 37, 137],
      ['pin-2-2', 37, 169],
    ]);
    expect(new Set(result.placements.map((p) => p.id)).size).toBe(3);
  });

  it('keeps ids on an empty panel and leaves the source alone', () => {
    const result = copyPlacements(a.placements, { ...b, placements: [] });
    expect(result.placements.map((p) => p.id)).toEqual(['pin', 'pin-2']);
    expect(a.placements).toHaveLength(2);
  });
});
