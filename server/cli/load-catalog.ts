import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import type { Catalog } from '../../shared/catalog/fitting';
import { mergeShopFittings } from '../../shared/catalog/merge-catalog';
import { parseFittingFile } from '../../shared/catalog/parse-catalog';
import type { ParseResult } from '../../shared/model/parse-job';
import type { CliIo } from './cli-io';
import { readJsonFile } from './read-json';

/**
 * The built-in catalog, with a shop's own fittings from a file when one is named. Every problem of that
 * file comes back as a line led by the file and the path of the value: `shop.json: fittings[3].id: …`.
 */
async function loadCatalog(shopFile: string | undefined): Promise<ParseResult<Catalog>> {
  if (shopFile === undefined) return { ok: true, value: builtinCatalog() };
  const read = await readJsonFile(shopFile);
  const parsed = read.ok ? parseFittingFile(read.value) : read;
  if (!parsed.ok) return { ok: false, errors: parsed.errors.map((e) => `${shopFile}: ${e}`) };
  const { catalog, problems } = mergeShopFittings(builtinCatalog(), parsed.value);
  return problems.length > 0 ? { ok: false, errors: problems.map((e) => `${shopFile}: ${e}`) } : { ok: true, value: catalog };
}

/** The catalog a command works with; when the shop's file cannot be used, says why on stderr and gives undefined. */
export async function catalogOrSay(io: CliIo, shopFile: string | undefined): Promise<Catalog | undefined> {
  const catalog = await loadCatalog(shopFile);
  if (catalog.ok) return catalog.value;
  io.err(['The shop fittings cannot be used:', ...catalog.errors.map((e) => `  ${e}`)].join('\n'));
  return undefined;
}
