import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { fitting, type Catalog, type Fitting } from '../../shared/catalog/fitting';
import { mergeShopFittings } from '../../shared/catalog/merge-catalog';
import type { Database } from '../db/client';
import { listShopFittings } from './catalog.repository';

/** A shop fitting as the catalog uses it, with who imported it and when. */
export interface ShopFitting {
  fitting: Fitting;
  importedBy: string | null;
  importedAt: Date;
}

/**
 * The shop's own fittings that the catalog takes: stored fittings are validated again on the way out,
 * so a row that no longer fits the schema is left out rather than trusted, and so is one whose id a
 * built-in fitting has since taken (a built-in fitting always wins).
 */
export async function shopFittingsInUse(db: Database): Promise<ShopFitting[]> {
  const rows = await listShopFittings(db);
  const valid = rows.flatMap((r): ShopFitting[] => {
    const parsed = fitting.safeParse(storedFitting(r.fitting));
    return parsed.success ? [{ fitting: parsed.data, importedBy: r.createdBy, importedAt: r.createdAt }] : [];
  });
  const { catalog } = mergeShopFittings(builtinCatalog(), valid.map((v) => v.fitting));
  return valid.filter((v) => catalog.get(v.fitting.id) === v.fitting);
}

/**
 * A stored fitting in today's form. Lift mechanisms imported before a range had to say what it is for were
 * checked for each mechanism, so that is what their range keeps meaning; everything else is as stored.
 */
function storedFitting(stored: unknown): unknown {
  if (typeof stored !== 'object' || stored === null) return stored;
  const { purpose, lift } = stored as { purpose?: unknown; lift?: unknown };
  if (purpose !== 'lift-mechanism' || typeof lift !== 'object' || lift === null || 'rangeFor' in lift) return stored;
  return { ...stored, lift: { ...lift, rangeFor: 'mechanism' } };
}

/**
 * The catalog everything on the server works with: the built-in fittings plus the shop's own
 * (design.md §4), as `shopFittingsInUse` takes them.
 */
export async function shopCatalog(db: Database): Promise<Catalog> {
  return mergeShopFittings(builtinCatalog(), (await shopFittingsInUse(db)).map((v) => v.fitting)).catalog;
}
