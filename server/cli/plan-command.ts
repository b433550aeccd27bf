import { parseArgs } from 'node:util';
import { planCarcass } from '../../shared/planner/plan-carcass';
import { planToJob } from '../../shared/planner/plan-job';
import { EXIT, type CliIo } from './cli-io';
import { catalogOrSay } from './load-catalog';
import { readJsonFile } from './read-json';
import { UNITS_OPTION, unitsHelp, unitOrSay } from './units-option';

export const PLAN_USAGE = `Usage: borewright plan <carcass.json> [--catalog <fittings.json>] [--units <unit>]

Plans one carcass from its description (docs/plan-input.md) and prints the job document of its panels,
with every placement, on standard output. Notes (hinges outside the usual range, shelves that sag,
a height that is not balanced) go to standard error, worded in --units; the job document is in mm.
  --catalog <file>       add a shop's own fittings to the built-in catalog
${unitsHelp('the unit of the notes and refusals\' lengths')}
Exit code: 0 when planned, 2 when the description cannot be used (each problem led by its path).`;

/** `borewright plan`: reads a carcass description and prints the planned job document. */
export async function planCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: { catalog: { type: 'string' }, ...UNITS_OPTION, help: { type: 'boolean', short: 'h' } },
  });
  if (values.help) {
    io.out(PLAN_USAGE);
    return EXIT.ok;
  }
  if (positionals.length !== 1) {
    io.err(`borewright plan: name one carcass file.\n\n${PLAN_USAGE}`);
    return EXIT.unusable;
  }
  const unit = unitOrSay(io, 'plan', values.units);
  if (!unit) return EXIT.unusable;
  const [file] = positionals;
  const catalog = await catalogOrSay(io, values.catalog);
  if (!catalog) return EXIT.unusable;
  const read = await readJsonFile(file);
  const result = read.ok ? planCarcass(read.value, catalog, { unit }) : read;
  if (!result.ok) {
    io.err([`${file} is not a carcass Borewright can plan:`, ...result.errors.map((e) => `  ${e}`)].join('\n'));
    return EXIT.unusable;
  }
  for (const note of result.plan.notes) io.err(`note: ${note}`);
  io.out(JSON.stringify(planToJob(result.plan), null, 2));
  return EXIT.ok;
}
