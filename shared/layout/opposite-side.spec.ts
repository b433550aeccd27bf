import { describe, expect, it } from 'vitest';
import { makeJob, makePanel } from '../testing/make-job';
import { drillingForOppositeSide } from './opposite-side';

describe('drillingForOppositeSide', () => {
  const job = makeJob([
    makePanel('left', {
      placements: [{ id: 'lift', fitting: 'lift-light', x: 37, y: 600, face: 'A', rotation: 0, params: { k: 1 } }],
      bores: [{ id: 'dowel', edge: 'y0', at: 37, z: 9, diameter: 8, depth: 21 }],
    }),
    makePanel('right', { height: 700, placements: [{ id: 'old', fitting: 'plate-0', x: 37, y: 104, face: 'A' }] }),
  ]);
  const [left, right] = job.panels;

  it('keeps every number in the frame: front edge, bottom and inside face map onto each other', () => {
    const result = drillingForOppositeSide(left, right);
    expect(result.placements).toEqual(left.placements);
    expect(result.bores).toEqual(left.bores);
    expect(result).toMatchObject({ id: 'right', height: 700 });
  });

  it('copies, so editing the result leaves the source alone', () => {
    const result = drillingForOppositeSide(left, right);
    result.placements[0].params!['k'] = 2;
    result.bores[0].diameter = 10;
    expect(left.placements[0].params).toEqual({ k: 1 });
    expect(left.bores[0].diameter).toBe(8);
  });
});
