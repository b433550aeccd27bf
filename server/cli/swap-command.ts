import { parseArgs } from 'node:util';
import { checkSwap } from '../../shared/swap/check-swap';
import { EXIT, type CliIo } from './cli-io';
import { catalogOrSay } from './load-catalog';
import { jobOrSay } from './load-job';
import { swapText } from './swap-text';

export const SWAP_USAGE = `Usage: borewright swap <job.json> --from <fitting> --to <fitting> [--json] [--catalog <fittings.json>]

Checks what replacing every placement of one fitting by another does to the panels that use it: the
holes reused as they are, the new holes, the new holes that clash with existing ones, and the old holes
left unused (and whether they show on a visible face); then each panel's verdict (fine, to drill, to
remake) and what the checks find after the swap. The job file is not changed.
  --from <fitting>       the fitting the job uses
  --to <fitting>         its replacement, of the same kind (a hinge for a hinge)
  --json                 print the report as JSON, for other programs
  --catalog <file>       add a shop's own fittings to the built-in catalog
Exit code: 0 when no drilled panel must be remade and the checks find no new error, 1 when one must or
they do, 2 when the file or the fittings cannot be used.`;

/** `borewright swap`: reads a job document and prints the swap check of one fitting for another. */
export async function swapCommand(args: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: {
      from: { type: 'string' },
      to: { type: 'string' },
      json: { type: 'boolean' },
      catalog: { type: 'string' },
      help: { type: 'boolean', short: 'h' },
    },
  });
  if (values.help) {
    io.out(SWAP_USAGE);
    return EXIT.ok;
  }
  if (positionals.length !== 1 || values.from === undefined || values.to === undefined) {
    const what = positionals.length !== 1 ? 'name one job file' : `name the fitting ${values.from === undefined ? 'to replace with --from' : 'that replaces it with --to'}`;
    io.err(`borewright swap: ${what}.\n\n${SWAP_USAGE}`);
    return EXIT.unusable;
  }
  const [file] = positionals;
  const job = await jobOrSay(io, file, 'check');
  if (!job) return EXIT.unusable;
  const catalog = await catalogOrSay(io, values.catalog);
  if (!catalog) return EXIT.unusable;
  const result = checkSwap(job, catalog, values.from, values.to);
  if (!result.ok) {
    io.err(`borewright swap: ${result.message}`);
    return EXIT.unusable;
  }
  const { report } = result;
  io.out(values.json ? JSON.stringify({ job: job.name, ...report }, null, 2) : swapText(job.name, report));
  const remake = report.panels.some((p) => p.drilled && p.verdict === 'to-remake');
  return remake || report.findings.added.some((f) => f.severity === 'error') ? EXIT.findings : EXIT.ok;
}
