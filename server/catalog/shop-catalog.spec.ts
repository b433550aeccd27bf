import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { shopFittings } from '../db/schema';
import { inShop } from '../db/shop-scope';
import { createTestApp, DEMO_SHOP_ID, type TestApp } from '../testing/test-app';
import { shopCatalog } from './shop-catalog';

describe('shopCatalog', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('adds valid shop fittings, leaves out broken rows and never lets one replace a built-in fitting', async () => {
    const builtin = builtinCatalog();
    const pin = builtin.get('shelf-pin-5')!;
    await t.database.db.insert(shopFittings).values([
      { shopId: DEMO_SHOP_ID, fittingId: 'shop-pin', fitting: { ...pin, id: 'shop-pin', name: 'Shop pin' } },
      { shopId: DEMO_SHOP_ID, fittingId: 'shelf-pin-5', fitting: { ...pin, name: 'Clashing pin' } },
      { shopId: DEMO_SHOP_ID, fittingId: 'broken', fitting: { id: 'broken' } as never },
    ]);
    const catalog = await inShop(DEMO_SHOP_ID, () => shopCatalog(t.database.db));
    expect(catalog.get('shop-pin')?.name).toBe('Shop pin');
    expect(catalog.get('shelf-pin-5')?.name).toBe(pin.name);
    expect(catalog.has('broken')).toBe(false);
    expect(catalog.size).toBe(builtin.size + 1);
  });

  it('reads a lift mechanism stored before ranges said what they are for as a range for each mechanism', async () => {
    const light = builtinCatalog().get('lift-light');
    if (light?.purpose !== 'lift-mechanism') throw new Error('the built-in catalog has no light mechanism');
    const { rangeFor: _, ...lift } = light.lift;
    await t.database.db.insert(shopFittings).values([{ shopId: DEMO_SHOP_ID, fittingId: 'old-lift', fitting: { ...light, id: 'old-lift', lift } as never }]);
    const stored = (await inShop(DEMO_SHOP_ID, () => shopCatalog(t.database.db))).get('old-lift');
    expect(stored?.purpose === 'lift-mechanism' && stored.lift.rangeFor).toBe('mechanism');
  });
});
