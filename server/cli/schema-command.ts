import { jobDocumentJsonSchema } from '../../shared/model/parse-job';
import { EXIT, type CliIo } from './cli-io';

export const SCHEMA_USAGE = `Usage: borewright schema

Prints the JSON Schema (draft 2020-12) of the job document, format borewright.job/1.`;

/** `borewright schema`: prints the job document's JSON Schema. */
export function schemaCommand(args: string[], io: CliIo): number {
  if (args.includes('--help') || args.includes('-h')) {
    io.out(SCHEMA_USAGE);
    return EXIT.ok;
  }
  if (args.length > 0) {
    io.err(`borewright schema: unexpected ${args.join(' ')}\n\n${SCHEMA_USAGE}`);
    return EXIT.unusable;
  }
  io.out(JSON.stringify(jobDocumentJsonSchema(), null, 2));
  return EXIT.ok;
}
