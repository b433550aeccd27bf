import type { JobDocument } from '../../shared/model/job-document';
import { parseJobDocument } from '../../shared/model/parse-job';
import type { CliIo } from './cli-io';
import { readJsonFile } from './read-json';

/**
 * The job document a command works on; when the file cannot be read as one, says why on stderr, every
 * problem led by its path, and gives undefined. `verb` says what the command does with it ("check").
 */
export async function jobOrSay(io: CliIo, file: string, verb: string): Promise<JobDocument | undefined> {
  const read = await readJsonFile(file);
  const parsed = read.ok ? parseJobDocument(read.value) : read;
  if (parsed.ok) return parsed.value;
  io.err([`${file} is not a job document Borewright can ${verb}:`, ...parsed.errors.map((e) => `  ${e}`)].join('\n'));
  return undefined;
}
