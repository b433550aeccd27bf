import { describe, expect, it } from 'vitest';
import { builtinCatalog } from './builtin-catalog';
import { mergeShopFittings } from './merge-catalog';

describe('mergeShopFittings', () => {
  it('adds a shop fitting and refuses one that would replace a built-in', () => {
    const builtin = builtinCatalog();
    const plate = builtin.get('plate-0')!;
    const own = { ...plate, id: 'shop-plate-3', name: 'Our plate, 3 mm' };
    const impostor = { ...plate, bores: [{ ...plate.bores[0], diameter: 9 }] };
    const { catalog, problems } = mergeShopFittings(builtin, [own, impostor, own]);
    expect(catalog.get('shop-plate-3')).toBe(own);
    expect(catalog.get('plate-0')).toBe(plate);
    expect(catalog.size).toBe(builtin.size + 1);
    expect(problems).toEqual([
      'fittings[1].id: "plate-0" is a built-in fitting; give the shop\'s fitting an id of its own',
      'fittings[2].id: duplicate id "shop-plate-3"',
    ]);
    expect(builtin.has('shop-plate-3')).toBe(false);
  });
});
