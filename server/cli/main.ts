import { EXIT, processIo, type CliIo } from './cli-io';

export const USAGE = `Usage: borewright <command> [options]

Works on Borewright job documents (format borewright.job/1) without a server.

Commands:
  check <job.json>   check every panel and print the findings grouped by panel (--json for programs)
  pack <job.json>    write the bench pack: drilling maps, DXF, template sheets, lists (-o pack.zip)
  plan <carcass.json> plan one carcass and print the job document of its panels
  swap <job.json>    check a fitting's replacement: holes reused, new, clashing, unused (--from, --to)
  catalog            list the fittings of the built-in catalog (--json for programs)
  schema             print the JSON Schema of the job document
  admin add          add a member to the shop's database, such as the first admin of a production install
  shop               the operator's shops: list, add (with its first admin), suspend, resume

Lengths print in mm; check, plan and pack take --units in|in-32|in-64 for inches.
Run borewright <command> --help for its options.
Exit code: 0 all clear, 1 a check found an error, 2 the command could not run.`;

type Command = (args: string[], io: CliIo) => number | Promise<number>;

/**
 * Each command loads only what it needs when it runs: a check need not load the PDF, font and database
 * packages that pack and admin use, which would cost a command more than its work.
 */
const COMMANDS: Record<string, () => Promise<Command>> = {
  admin: async () => (await import('./admin-command')).adminCommand,
  shop: async () => (await import('./shop-command')).shopCommand,
  check: async () => (await import('./check-command')).checkCommand,
  pack: async () => (await import('./pack-command')).packCommand,
  plan: async () => (await import('./plan-command')).planCommand,
  swap: async () => (await import('./swap-command')).swapCommand,
  catalog: async () => (await import('./catalog-command')).catalogCommand,
  schema: async () => (await import('./schema-command')).schemaCommand,
};

/** Runs the command line and returns the exit code. Never throws on bad arguments or files. */
export async function main(argv: string[], io: CliIo = processIo): Promise<number> {
  const [name, ...args] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(USAGE);
    return EXIT.ok;
  }
  const command = Object.hasOwn(COMMANDS, name) ? await COMMANDS[name]() : undefined;
  if (!command) {
    io.err(`borewright: no command "${name}".\n\n${USAGE}`);
    return EXIT.unusable;
  }
  try {
    return await command(args, io);
  } catch (error) {
    // parseArgs throws on an unknown or incomplete option; its message says which.
    if ((error as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) {
      io.err(`borewright ${name}: ${(error as Error).message}\n\nRun borewright ${name} --help for its options.`);
      return EXIT.unusable;
    }
    throw error;
  }
}
