import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../../shared/catalog/builtin-catalog';
import { sidePanel } from '../document/testing';
import { placementFields, readNumber } from './placement-fields';

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

  it('refuses a position off the panel with a message, and reads a comma as the decimal point', () => {
    const [x] = placementFields(panel, undefined);
    expect(readNumber('600', x)).toEqual({ message: 'The x must be from 0 to 560 mm to stay on the panel.' });
    expect(readNumber('abc', x)).toEqual({ message: 'Enter the x in mm.' });
    expect(readNumber('37,5', x)).toEqual({ value: 37.5 });
  });
});
