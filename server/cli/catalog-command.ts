import { parseArgs } from 'node:util';
import { EXIT, type CliIo } from './cli-io';
import { catalogOrSay } from './load-catalog';

export const CATALOG_USAGE = `Usage: borewright catalog [--json] [--catalog <fittings.json>]

Lists the fittings of the built-in catalog.
  --json                 print them as a catalog file, for other programs
  --catalog <file>       add a shop's own fittings (checked as on import)`;

/** `borewright catalog`: lists the fittings by id, purpose and name. */
export async function catalogCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: { json: { type: 'boolean' }, catalog: { type: 'string' }, help: { type: 'boolean', short: 'h' } },
  });
  if (values.help) {
    io.out(CATALOG_USAGE);
    return EXIT.ok;
  }
  if (positionals.length > 0) {
    io.err(`borewright catalog: unexpected ${positionals.join(' ')}\n\n${CATALOG_USAGE}`);
    return EXIT.unusable;
  }
  const catalog = await catalogOrSay(io, values.catalog);
  if (!catalog) return EXIT.unusable;
  const fittings = [...catalog.values()];
  if (values.json) {
    io.out(JSON.stringify({ fittings }, null, 2));
    return EXIT.ok;
  }
  const idWidth = Math.max(...fittings.map((f) => f.id.length)) + 2;
  const lines = fittings.map((f) => {
    const row = f.onSystemRow ? ', on a system row' : '';
    return `${f.id.padEnd(idWidth)}${f.purpose.padEnd(16)}${f.name} (${f.bores.length} bore${f.bores.length === 1 ? '' : 's'}${row})`;
  });
  io.out([`${fittings.length} fittings`, '', ...lines].join('\n'));
  return EXIT.ok;
}
