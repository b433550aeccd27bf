import { readFile } from 'node:fs/promises';
import { jsonTooDeep, TOO_DEEP_MESSAGE } from '../../shared/model/json-depth';
import type { ParseResult } from '../../shared/model/parse-job';

/** Reads a JSON file; says in plain words why it cannot, without a stack trace. */
export async function readJsonFile(path: string): Promise<ParseResult<unknown>> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : String(error);
    return { ok: false, errors: [`cannot be read: ${why}`] };
  }
  // A byte-order mark from a spreadsheet or editor is not part of the JSON.
  const json = text.replace(/^\uFEFF/, '');
  if (jsonTooDeep(json)) return { ok: false, errors: [TOO_DEEP_MESSAGE] };
  try {
    return { ok: true, value: JSON.parse(json) };
  } catch (error) {
    return { ok: false, errors: [`is not valid JSON: ${(error as Error).message}`] };
  }
}
