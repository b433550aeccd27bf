import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { fitting, type Catalog, type Fitting } from '../../shared/catalog/fitting';
import { mergeShopFittings } from '../../shared/catalog/merge-catalog';
import type { Database } from '../db/client';
import { shopFittings } from '../db/schema';

/**
 * The catalog everything on the server works with: the built-in fittings plus the shop's own
 * (design.md §4). Stored fittings are validated again on the way out, so a row that no longer fits
 * the schema is left out rather than trusted; a built-in fitting always wins over a clashing id.
 */
export async function shopCatalog(db: Database): Promise<Catalog> {
  const rows = await db.select({ fitting: shopFittings.fitting }).from(shopFittings).orderBy(shopFittings.id);
  const valid = rows.flatMap((r): Fitting[] => {
    const parsed = fitting.safeParse(r.fitting);
    return parsed.success ? [parsed.data] : [];
  });
  return mergeShopFittings(builtinCatalog(), valid).catalog;
}
