import { open, rename, rm, stat, type FileHandle } from 'node:fs/promises';
import { pipeline } from 'node:stream/promises';
import { parseArgs } from 'node:util';
import { notDrilled } from '../../shared/export/drilling-programs';
import { DEFAULT_MACHINE_SETTINGS, machineSettings, type MachineSettings } from '../../shared/export/machine-settings';
import { jobDrilling } from '../../shared/export/panel-drilling';
import type { PaperName } from '../../shared/export/paper';
import { GENERATOR, packTools } from '../export/export-platform';
import { packThreads, planPackAhead } from '../export/files-ahead';
import { packZipStream } from '../export/pack-zip';
import { EXIT, type CliIo } from './cli-io';
import { catalogOrSay } from './load-catalog';
import { jobOrSay } from './load-job';
import { progressLine, type ProgressStream } from './progress-line';
import { readJsonFile } from './read-json';
import { UNITS_OPTION, unitsHelp, unitOrSay } from './units-option';

export const PACK_USAGE = `Usage: borewright pack <job.json> -o <pack.zip> [--paper a4|letter] [--catalog <fittings.json>] [--units <unit>] [--gcode [--machine <machine.json>]]

Writes the bench pack of a job document: per panel its drilling maps (SVG), a DXF file and template
sheets to print at 100 % (PDF), in a folder per carcass, all drawn from one list of the panel's holes;
a cover sheet (the order of work, what the pack holds), panel labels, a README sheet (the files and the
DXF layer names), the hole schedule, the hardware list and a manifest with the SHA-256 of every file.
  -o, --output <file>    the zip to write
  --paper a4|letter      the paper the template sheets are tiled onto (default a4)
  --catalog <file>       add a shop's own fittings to the built-in catalog
${unitsHelp('the unit of the sheets, labels and cover sheet (DXF, G-code in mm)')}
  --gcode                add drilling programs (G-code, ISO 6983 / RS-274 words, mm): per panel one
                         for each face and edge with holes, beside its DXF
  --machine <file>       the machine's conventions for --gcode (zero corner, Z zero, heights, spoilboard
                         allowance, tools by diameter), as docs/machine-settings.md describes; without it
                         the defaults. Prove every new program in the air or on scrap first.
Exit code: 0 written, 1 written but the checks found errors (the cover sheet says so),
2 nothing written: the job file, the options or the output cannot be used.`;

const PAPERS: readonly PaperName[] = ['a4', 'letter'];

const megabytes = (bytes: number) => `${(bytes / 1e6).toFixed(1)} MB`;

/** Why a file cannot be opened for writing, in plain words. */
function whyNot(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  return code === 'ENOENT' ? 'its folder does not exist' : code === 'EACCES' || code === 'EPERM' ? 'permission denied' : code === 'EISDIR' ? 'it is a folder' : (error as Error).message;
}

/** The machine settings for --gcode: the defaults, or a file's, every problem led by the file and the value's path. */
async function machineOrSay(io: CliIo, file: string | undefined): Promise<MachineSettings | undefined> {
  if (file === undefined) return DEFAULT_MACHINE_SETTINGS;
  const read = await readJsonFile(file);
  if (!read.ok) {
    io.err(`borewright pack: ${file} ${read.errors.join('; ')}`);
    return undefined;
  }
  const parsed = machineSettings.safeParse(read.value);
  if (parsed.success) return parsed.data;
  io.err(['The machine settings cannot be used:', ...parsed.error.issues.map((i) => `  ${file}: ${i.path.join('.') || '(the file)'}: ${i.message}`)].join('\n'));
  return undefined;
}

/** `borewright pack`: writes a job's bench pack as a zip, streamed, with a progress line on standard error. */
export async function packCommand(args: string[], io: CliIo, progressStream?: ProgressStream): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    options: {
      output: { type: 'string', short: 'o' },
      paper: { type: 'string', default: 'a4' },
      catalog: { type: 'string' },
      gcode: { type: 'boolean' },
      machine: { type: 'string' },
      ...UNITS_OPTION,
      help: { type: 'boolean', short: 'h' },
    },
  });
  if (values.help) {
    io.out(PACK_USAGE);
    return EXIT.ok;
  }
  const paper = values.paper as PaperName;
  const problem =
    positionals.length !== 1
      ? 'name one job file'
      : values.output === undefined
        ? 'say where to write the pack with -o <pack.zip>'
        : !PAPERS.includes(paper)
          ? `--paper must be a4 or letter, not "${values.paper}"`
          : values.machine !== undefined && !values.gcode
            ? '--machine sets up the drilling programs: give --gcode with it'
            : undefined;
  if (problem) {
    io.err(`borewright pack: ${problem}.\n\n${PACK_USAGE}`);
    return EXIT.unusable;
  }
  const unit = unitOrSay(io, 'pack', values.units);
  if (!unit) return EXIT.unusable;
  const [file] = positionals;
  const output = values.output as string;
  const job = await jobOrSay(io, file, 'pack');
  if (!job) return EXIT.unusable;
  const catalog = await catalogOrSay(io, values.catalog);
  if (!catalog) return EXIT.unusable;
  const machine = values.gcode ? await machineOrSay(io, values.machine) : undefined;
  if (values.gcode && !machine) return EXIT.unusable;

  // Written beside the target and renamed when whole, so a failed run never leaves half a pack under its
  // name; opened first, so that an output that cannot be written is told before any work is done.
  const partial = `${output}.part`;
  let target: FileHandle;
  try {
    target = await open(partial, 'w');
  } catch (error) {
    io.err(`borewright pack: cannot write ${output}: ${whyNot(error)}.`);
    return EXIT.unusable;
  }
  const ctx = { job, catalog, date: new Date(), generator: GENERATOR, unit };
  const progress = progressLine(progressStream);
  const pack = planPackAhead({ ctx, paper, ...(machine ? { machine } : {}), ...(await packTools()), onProgress: progress.update }, packThreads());
  try {
    await pipeline(packZipStream(pack, ctx.date), target.createWriteStream());
    await rename(partial, output);
  } catch (error) {
    progress.end();
    await rm(partial, { force: true });
    io.err(`borewright pack: could not write ${output}: ${(error as Error).message}`);
    return EXIT.unusable;
  }
  progress.end();
  const { size } = await stat(output);
  io.out(`Wrote ${output}: ${job.panels.length} panels, ${pack.files.length} files, ${megabytes(size)}, template sheets on ${paper === 'a4' ? 'A4' : 'US Letter'}.`);
  if (machine) {
    const leftOut = jobDrilling(job, catalog, []).reduce((sum, d) => sum + notDrilled(d, machine).length, 0);
    io.out(
      leftOut === 0
        ? 'Drilling programs (G-code) drill every hole. Prove every new program in the air or on scrap first.'
        : `Drilling programs (G-code) leave out ${leftOut} hole${leftOut === 1 ? '' : 's'} (no tool of the diameter, or a through hole with no spoilboard allowance): README.txt lists them. Prove every new program in the air or on scrap first.`,
    );
  }
  if (pack.errors === 0) return EXIT.ok;
  io.err(`The checks found ${pack.errors} error${pack.errors === 1 ? '' : 's'}: the pack says "contains errors" on its cover sheet. Run borewright check ${file} for the list.`);
  return EXIT.findings;
}
