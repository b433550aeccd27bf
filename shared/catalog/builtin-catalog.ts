import connectors from '../../hardware-catalog/connectors.json';
import hinges from '../../hardware-catalog/hinges.json';
import liftMechanisms from '../../hardware-catalog/lift-mechanisms.json';
import plates from '../../hardware-catalog/plates.json';
import runners from '../../hardware-catalog/runners.json';
import shelfPins from '../../hardware-catalog/shelf-pins.json';
import type { Catalog, Fitting } from './fitting';
import { catalogOf, parseFittingFile } from './parse-catalog';

/**
 * The built-in catalog files, one per family. They are imported as modules, not read from disk, so the
 * same catalog loads in the browser, the server and the command line.
 */
export const BUILTIN_CATALOG_FILES: Readonly<Record<string, unknown>> = {
  'hinges.json': hinges,
  'plates.json': plates,
  'lift-mechanisms.json': liftMechanisms,
  'shelf-pins.json': shelfPins,
  'runners.json': runners,
  'connectors.json': connectors,
};

let builtin: Catalog | undefined;

/**
 * The built-in fittings, validated once. A broken built-in file is a mistake in the product itself, not in
 * anyone's input, so it throws, naming the file and every problem by its path.
 */
export function builtinCatalog(): Catalog {
  if (builtin) return builtin;
  const fittings: Fitting[] = [];
  const problems: string[] = [];
  for (const [file, content] of Object.entries(BUILTIN_CATALOG_FILES)) {
    const result = parseFittingFile(content);
    if (!result.ok) problems.push(...result.errors.map((e) => `hardware-catalog/${file}: ${e}`));
    else fittings.push(...result.value);
  }
  const catalog = catalogOf(fittings);
  if (catalog.size !== fittings.length) problems.push('hardware-catalog: a fitting id is used in two files');
  if (problems.length > 0) throw new Error(`The built-in hardware catalog is invalid:\n${problems.join('\n')}`);
  builtin = catalog;
  return catalog;
}
