import { parseArgs } from 'node:util';
import { checkJob } from '../../shared/checks/index';
import { EXIT, type CliIo } from './cli-io';
import { countFindings, findingsText } from './findings-text';
import { catalogOrSay } from './load-catalog';
import { jobOrSay } from './load-job';
import { UNITS_OPTION, unitsHelp, unitOrSay } from './units-option';

export const CHECK_USAGE = `Usage: borewright check <job.json> [--json] [--catalog <fittings.json>] [--units <unit>]

Checks every panel of a job document and prints the findings, grouped by panel.
  --json                 print the findings as JSON, for other programs
  --catalog <file>       add a shop's own fittings to the built-in catalog
${unitsHelp('the unit of the lengths in the findings\' words')}
Exit code: 0 when no error is found (warnings allowed), 1 when one is, 2 when the file cannot be used.`;

/** `borewright check`: reads, validates and checks a job document. */
export async function checkCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: { json: { type: 'boolean' }, catalog: { type: 'string' }, ...UNITS_OPTION, help: { type: 'boolean', short: 'h' } },
  });
  if (values.help) {
    io.out(CHECK_USAGE);
    return EXIT.ok;
  }
  if (positionals.length !== 1) {
    io.err(`borewright check: name one job file.\n\n${CHECK_USAGE}`);
    return EXIT.unusable;
  }
  const unit = unitOrSay(io, 'check', values.units);
  if (!unit) return EXIT.unusable;
  const [file] = positionals;
  const job = await jobOrSay(io, file, 'check');
  if (!job) return EXIT.unusable;
  const catalog = await catalogOrSay(io, values.catalog);
  if (!catalog) return EXIT.unusable;
  const findings = checkJob(job, catalog, { unit });
  const counts = countFindings(findings);
  io.out(values.json ? JSON.stringify({ job: job.name, panels: job.panels.length, ...counts, findings }, null, 2) : findingsText(job, findings));
  return counts.errors > 0 ? EXIT.findings : EXIT.ok;
}
