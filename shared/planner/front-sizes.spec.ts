import { describe, expect, it } from 'vitest';
import { lengthWording } from '../checks/wording';
import { frontSizes } from './front-sizes';

// Overlay = how far a front reaches over the side's inside face; the relation to the hinge is
// overlay = constant + B − plate height (trade-reference §2, common practice). Reveal: the gap between
// neighbouring fronts, half of it at each outer edge. Box 600 × 723, 19 mm board, reveal 3 mm.
describe('frontSizes', () => {
  const box = { width: 600, height: 723, thickness: 19 };
  const sizes = (kind: 'full' | 'half' | 'inset', count: number) => {
    const s = frontSizes(lengthWording('mm'), kind, count, 3, box);
    return [s.width.value, s.height.value, s.dy.value, s.overlay.value];
  };

  it('full overlay covers the side less half a reveal', () => {
    // one: 600 − 3 = 597; two: (600 − 3 − 3) / 2 = 297; overlay 19 − 1.5 = 17.5.
    expect(sizes('full', 1)).toEqual([597, 720, 1.5, 17.5]);
    expect(sizes('full', 2)).toEqual([297, 720, 1.5, 17.5]);
  });

  it('half overlay leaves half of each side to the next carcass', () => {
    // one: 600 − 19 − 3 = 578; two: (600 − 19 − 6) / 2 = 287.5; overlay 9.5 − 1.5 = 8.
    expect(sizes('half', 1)).toEqual([578, 720, 1.5, 8]);
    expect(sizes('half', 2)).toEqual([287.5, 720, 1.5, 8]);
  });

  it('inset sits within the box with a reveal all round', () => {
    // one: 600 − 38 − 6 = 556, 723 − 38 − 6 = 679, 22 mm up; two: (600 − 38 − 9) / 2 = 276.5.
    expect(sizes('inset', 1)).toEqual([556, 679, 22, -3]);
    expect(sizes('inset', 2)).toEqual([276.5, 679, 22, -3]);
  });
});
