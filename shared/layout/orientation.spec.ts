import { fc, test } from '@fast-check/vitest';
import { describe, expect, it } from 'vitest';
import { orientEdge, orientOffset } from './orientation';

describe('orientOffset', () => {
  it('turns counter-clockwise, mirrors first, and mirrors face B in x as seen from face A', () => {
    expect(orientOffset(10, 0, { rotation: 90, face: 'A' })).toEqual([0, 10]);
    expect(orientOffset(10, 5, { rotation: 180, face: 'A' })).toEqual([-10, -5]);
    expect(orientOffset(10, 5, { rotation: 0, face: 'A', mirrored: true })).toEqual([-10, 5]);
    expect(orientOffset(10, 5, { rotation: 0, face: 'B' })).toEqual([-10, 5]);
    expect(orientOffset(10, 0, { rotation: 90, face: 'B' })).toEqual([0, 10]);
  });

  test.prop([fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true })])(
    'four quarter turns change nothing',
    (dx, dy) => {
      let p: [number, number] = [dx, dy];
      for (let i = 0; i < 4; i++) p = orientOffset(p[0], p[1], { rotation: 90, face: 'A' });
      expect(p).toEqual([dx + 0, dy + 0]);
    },
  );
});

describe('orientEdge', () => {
  it('follows the turn and the face', () => {
    expect(orientEdge('y0', { rotation: 0, face: 'A' })).toBe('y0');
    expect(orientEdge('y0', { rotation: 90, face: 'A' })).toBe('x1');
    expect(orientEdge('y0', { rotation: 90, face: 'B' })).toBe('x0');
    expect(orientEdge('x0', { rotation: 0, face: 'A', mirrored: true })).toBe('x1');
  });
});
