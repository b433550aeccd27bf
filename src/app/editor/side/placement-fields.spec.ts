import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../../shared/catalog/builtin-catalog';
import { sidePanel } from '../document/testing';
import { placementFields, readLength } from './placement-fields';

describe('placementFields', () => {
  const panel = sidePanel();

  it('limits the position to the panel and a hinge\'s cup-boring distance to its range', () => {
    const fields = placementFields(panel, builtinCatalog().get('hinge-full-overlay-45'));
    expect(fields.map((f) => [f.key, f.min, f.max])).toEqual([
      ['x', 0, 560],
      ['y', 0, 720],
      ['boringDistance', expect.any(Number), expect.any(Number)],
    ]);
    expect(placementFields(panel, undefined)).toHaveLength(2);
  });

  it('refuses a position off the panel with a message in the user\'s unit', () => {
    const [x] = placementFields(panel, undefined);
    expect(readLength('600', x, 'mm')).toEqual({ message: 'The x must be from 0 mm to 560 mm to stay on the panel.' });
    // 560 mm = 22.047 in, to the nearest 1/32: 22 2/32 = 22 1/16 (the international inch, 25.4 mm: published)
    expect(readLength('23"', x, 'in-32')).toEqual({ message: 'The x must be from 0" to 22 1/16" to stay on the panel.' });
    expect(readLength('abc', x, 'mm')).toEqual({ message: '"abc" is not a length: type e.g. 314.3 mm or 12 3/8".' });
  });

  it('reads either unit, a bare number in the user\'s own, and refuses a decimal comma that could be a thousands mark', () => {
    const [, y] = placementFields(panel, undefined);
    expect(readLength('37.5', y, 'mm')).toEqual({ value: 37.5 });
    expect(readLength('12 3/8"', y, 'mm')).toEqual({ value: 314.325 }); // 12.375 × 25.4
    expect(readLength('12 3/8', y, 'in-64')).toEqual({ value: 314.325 });
    expect(readLength('314.3 mm', y, 'in')).toEqual({ value: 314.3 });
    expect(readLength('37,5', y, 'mm')).toEqual({ message: 'Use a point for decimals, e.g. 314.3 mm or 12.375".' });
  });
});
