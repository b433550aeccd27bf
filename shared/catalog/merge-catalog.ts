import type { Catalog, Fitting } from './fitting';

/**
 * Adds a shop's own fittings to the built-in ones. A shop fitting can never replace or break a built-in
 * one: a fitting whose id is already taken is left out and reported by its path in the shop's file;
 * the others are added. Validate the shop's file with `parseFittingFile` first.
 */
export function mergeShopFittings(
  builtin: Catalog,
  shopFittings: readonly Fitting[],
): { catalog: Catalog; problems: string[] } {
  const merged = new Map(builtin);
  const problems: string[] = [];
  shopFittings.forEach((f, i) => {
    if (builtin.has(f.id)) {
      problems.push(`fittings[${i}].id: "${f.id}" is a built-in fitting; give the shop's fitting an id of its own`);
    } else if (merged.has(f.id)) {
      problems.push(`fittings[${i}].id: duplicate id "${f.id}"`);
    } else {
      merged.set(f.id, f);
    }
  });
  return { catalog: merged, problems };
}
